import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import { benchRun, BENCH_RULE } from '../../workers/node/bench-demos';
import { launchBrowser, signIn } from '../helpers/browser';
import { writeReadmeSection } from '../helpers/readme-section';
import { startServer } from '../helpers/server';

/**
 * Time to a decision in Chromium, from clicking Run to the decision on screen (the headline), for every seeded demo scenario set to the
 * bench's rule (BENCH_RULE: batches of 250 particles, ±10 % or a decided verdict, at most 160 batches), as an engineer would see it.
 * `npm run bench:browser` (after a build); `-- --readme` rewrites the README block.
 */
const PAUSE_MS = 3000; // a user's pause between opening the page and clicking Run: the workers' warm-up pieces run meanwhile

if (!fs.existsSync('dist/index.html')) execFileSync('npx', ['vite', 'build'], { stdio: 'inherit' });

interface Row {
  name: string;
  seconds: number;
  /** A second run on the same page, with the server's next seed. */
  secondsAgain: number;
  batchesAgain: string;
  stopped: string;
  banner: string;
}

const server = await startServer({ DEMO_PARTICLES: '1000' });
const browser = await launchBrowser();
const rows: Row[] = [];
let workers = 0;
try {
  const page = await browser.newPage();
  // Counts the engine's workers as the page starts them (the pool keeps them between runs, so a page load starts its pool once).
  await page.addInitScript(() => {
    const Native = window.Worker;
    const w = window as unknown as { __workers: number };
    w.__workers = 0;
    window.Worker = class extends Native {
      constructor(url: string | URL, options?: WorkerOptions) {
        super(url, options);
        w.__workers += 1;
      }
    };
  });
  await signIn(page, server.url, 'engineer@motewalk.local', 'demo-engineer-pass');
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
  const list = await page.evaluate(async () => (await (await fetch('/api/scenarios?pageSize=200&sort=name&order=asc')).json()).items);
  for (const item of list as { id: number; name: string; workstationName: string }[]) {
    const { id } = item;
    const name = `${item.workstationName}, ${item.name.toLowerCase()}`;
    // The bench's rule replaces the demo's own run settings; the server picks each run's seed (its run ticket).
    const status = await page.evaluate(
      async ({ id, rule }) => {
        const current = await (await fetch(`/api/scenarios/${id}`)).json();
        const input = { ...current.input, run: { ...current.input.run, ...rule } };
        const res = await fetch(`/api/scenarios/${id}`, {
          method: 'PATCH',
          headers: { 'Content-Type': 'application/json' },
          body: JSON.stringify({ version: current.version, input }),
        });
        return res.status;
      },
      { id, rule: benchRun({}, BENCH_RULE.particlesPerBatch) },
    );
    if (status !== 200) throw new Error(`scenario ${id} (${name}): PATCH returned ${status}`);
    await page.goto(`${server.url}/scenarios/${id}`);
    const run = page.getByRole('button', { name: /^▶ Run/ });
    await run.waitFor();
    await page.waitForTimeout(PAUSE_MS);
    const started = Date.now();
    await run.click();
    const stopping = page.getByTestId('stopping');
    await stopping.waitFor({ timeout: 300_000 });
    const seconds = (Date.now() - started) / 1000;
    const text = (await stopping.textContent()) ?? '';
    const stopped = /stopped at ([\d,]+ batches because [^.]+)/.exec(text)?.[1] ?? text.slice(0, 80);
    // The run's own banner, in its headline (the page also shows the saved runs' and the station's).
    const banner = (await page.getByRole('region', { name: 'Headline' }).getByTestId('banner').first().getAttribute('data-banner')) ?? '?';
    // Again on the same page, once the charts below the headline are drawn (as a user reads them first): its workers
    // have now run this scenario's own branches, and the server hands out another seed.
    await page.getByText('Drawing the charts, maps and tables…').waitFor({ state: 'detached', timeout: 60_000 });
    const again = Date.now();
    await run.click();
    await page.waitForFunction(() =>
      [...document.querySelectorAll('button')].some((b) => b.textContent?.startsWith('▶ Run') && b.disabled),
    );
    await page.waitForFunction(
      () => [...document.querySelectorAll('button')].some((b) => b.textContent?.startsWith('▶ Run') && !b.disabled),
      null,
      {
        timeout: 300_000,
      },
    );
    const secondsAgain = (Date.now() - again) / 1000;
    const batchesAgain = /stopped at ([\d,]+) batches/.exec((await stopping.textContent()) ?? '')?.[1] ?? '?';
    workers = Math.max(workers, await page.evaluate(() => (window as unknown as { __workers: number }).__workers));
    rows.push({ name, seconds, secondsAgain, batchesAgain, stopped, banner });
    console.log(
      `${name}: ${seconds.toFixed(2)} s, again ${secondsAgain.toFixed(2)} s (${batchesAgain} batches), ${banner}, stopped at ${stopped}`,
    );
  }
} finally {
  await browser.close();
  await server.stop();
}

const lines = [
  `- Chromium ${execFileSync('/usr/bin/chromium', ['--version'], { stdio: ['ignore', 'pipe', 'ignore'] })
    .toString()
    .trim()
    .replace(/^Chromium /, '')
    .replace(
      / built on.*/,
      '',
    )}, headless, no GPU, ${workers} worker${workers === 1 ? '' : 's'} (this machine has ${os.cpus().length} hardware threads), load ${os.loadavg()[0].toFixed(2)}; from clicking Run to the decision on screen (the headline), ${PAUSE_MS / 1000} s after opening the page, each demo at ${BENCH_RULE.particlesPerBatch.toLocaleString('en-GB')} particles a batch to ±${100 * BENCH_RULE.relativeHalfWidth} % or a decision; the first run on the page, then a second one (another seed from the server) once the first one's sections have drawn:`,
  ...rows.map(
    (r) =>
      `  - ${r.name}: ${r.seconds.toFixed(2)} s first, ${r.secondsAgain.toFixed(2)} s again (${r.batchesAgain} batches); first run ${r.banner}, stopped at ${r.stopped}`,
  ),
];
console.log(lines.join('\n'));
if (process.argv.includes('--readme')) writeReadmeSection('bench:browser', lines);
