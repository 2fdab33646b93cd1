import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { createServer, type ViteDevServer } from 'vite';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PREVIEW_SCENARIO } from '@/features/run-results/dev/preview-scenario';
import { readableNumber } from '../../shared/format/index';
import { runEngine } from '../helpers/run-engine';
import { launchBrowser, shot } from '../helpers/browser';

let vite: ViteDevServer;
let browser: BrowserContext;
let page: Page;
let url: string;

beforeAll(async () => {
  // The project's own Vite config (root src/, React, Tailwind) on a free port; no build, no API server.
  vite = await createServer({
    configFile: path.resolve('vite.config.ts'),
    server: { port: 0, strictPort: false, hmr: false },
    logLevel: 'warn',
  });
  await vite.listen();
  url = `http://localhost:${(vite.httpServer!.address() as AddressInfo).port}/features/run-results/dev/preview.html`;
  browser = await launchBrowser();
  page = await browser.newPage();
});
afterAll(async () => {
  await browser?.close();
  await vite?.close();
});

const dotPositions = (view: 'plan' | 'elevation') =>
  page
    .getByTestId(`dots-${view}`)
    .locator('circle')
    .evaluateAll((cs) => cs.map((c) => `${c.getAttribute('data-slot')}:${c.getAttribute('cx')},${c.getAttribute('cy')}`));

describe('the run results preview', () => {
  it('runs the engine in the page and shows the banner and the 8-h TWA the engine computes', async () => {
    await page.goto(url);
    await page.getByRole('button', { name: 'Compute' }).click();
    await page.getByTestId('banner').first().waitFor();
    const { result } = runEngine(PREVIEW_SCENARIO);
    const expected = result as { breathingZone: { fractions: { respirable: { twa8h_mgPerM3: number } } }; limit: { banner: string } };
    expect(await page.getByTestId('banner').first().getAttribute('data-banner')).toBe(expected.limit.banner);
    expect(await page.getByTestId('twa').textContent()).toContain(
      `${readableNumber(expected.breathingZone.fractions.respirable.twa8h_mgPerM3)} mg/m³`,
    );
    for (const heading of [
      'Headline',
      'Breathing-zone concentration over time',
      'Concentrations by size fraction',
      'Where the dust went',
      'Particle paths, plan and elevation',
      'Floor deposition and capture velocity',
      'Analytic cross-checks',
      'Cautions',
    ]) {
      await expect.poll(() => page.getByRole('heading', { name: heading }).count()).toBe(1);
    }
    expect(await page.getByTestId('hood-face').count()).toBeGreaterThan(0);
    await shot(page, 'run-results-default');
  });

  it('switches the chart to another fraction from the keyboard, dropping the limit line', async () => {
    expect(await page.getByTestId('limit-line').count()).toBe(1);
    await page.getByRole('radio', { name: /Respirable/ }).focus();
    await page.keyboard.press('ArrowLeft');
    expect(await page.getByRole('radio', { name: 'Thoracic' }).isChecked()).toBe(true);
    await expect.poll(() => page.getByTestId('limit-line').count()).toBe(0);
    await page.keyboard.press('ArrowRight');
    await expect.poll(() => page.getByTestId('limit-line').count()).toBe(1);
  });

  it('downloads the fraction table as CSV with units in the headers', async () => {
    const download = page.waitForEvent('download');
    await page
      .getByRole('region', { name: 'Concentrations by size fraction' })
      .getByRole('button', { name: 'Download CSV', exact: true })
      .click();
    const file = await download;
    expect(file.suggestedFilename()).toMatch(/^motewalk-seed-7-fractions-\d{4}-\d{2}-\d{2}\.csv$/);
    const text = fs.readFileSync((await file.path())!, 'utf8');
    expect(text).toMatch(/^\uFEFFFraction,Task mean \(mg\/m³\),/);
    expect(text.trim().split('\r\n')).toHaveLength(5);
  });

  it('moves the particles when the scrubber is moved from the keyboard, showing the paths alive at that time', async () => {
    // A path is on screen from its release to its end (captured, settled, exhausted or the end of the run): count them from the
    // engine's own sample at the first frame from 10 on that has any.
    const { result } = runEngine(PREVIEW_SCENARIO);
    const t = (result as { trajectories: { particles: number; frameInterval_s: number; ends: number[] } }).trajectories;
    const alive = (time_s: number) =>
      Array.from({ length: t.particles }, (_, k) => t.ends[k * 8] <= time_s && time_s <= t.ends[k * 8 + 4]).filter(Boolean).length;
    expect(t.particles).toBeGreaterThanOrEqual(500);
    let target = 10;
    while (alive(target * t.frameInterval_s) === 0) target++;
    const scrubber = page.getByTestId('scrubber');
    await scrubber.focus();
    await page.keyboard.press('Home');
    const before = await dotPositions('plan');
    for (let i = 0; i < target; i++) await page.keyboard.press('ArrowRight');
    const time_s = target * t.frameInterval_s;
    await expect.poll(async () => Number(await scrubber.inputValue())).toBeCloseTo(time_s, 6);
    expect(await page.getByTestId('frame-time').textContent()).toContain(`t = ${Math.round(time_s)} s`);
    expect(Number(await page.getByTestId('airborne-count').textContent())).toBe(alive(time_s));
    const after = await dotPositions('plan');
    expect(after).toHaveLength(alive(time_s));
    expect(after).not.toEqual(before);
    await page.getByRole('heading', { name: 'Particle paths, plan and elevation' }).scrollIntoViewIfNeeded();
    await shot(page, 'run-results-scrubbed');
  });

  it('colours the particles by fate or by size, with the matching legend', async () => {
    expect(await page.getByRole('list', { name: 'Particle fates' }).count()).toBe(1);
    const fateColours = await page
      .getByTestId('dots-plan')
      .locator('circle')
      .evaluateAll((cs) => cs.map((c) => c.getAttribute('fill')));
    await page.locator('label', { hasText: /^Size$/ }).click();
    await expect.poll(() => page.getByRole('list', { name: 'Particle size classes' }).count()).toBe(1);
    expect(await page.getByRole('list', { name: 'Particle fates' }).count()).toBe(0);
    const sizeColours = await page
      .getByTestId('dots-plan')
      .locator('circle')
      .evaluateAll((cs) => cs.map((c) => c.getAttribute('fill')));
    expect(sizeColours).toHaveLength(fateColours.length);
    expect(sizeColours).not.toEqual(fateColours);
    await page.locator('label', { hasText: 'Where it ends up' }).click();
  });

  it('opens the plan on the workstation and zooms out to the whole room and back from the keyboard', async () => {
    const plan = page.getByRole('group', { name: /^Plan view of the/ });
    const zoom = async () => Number(await plan.getAttribute('data-zoom'));
    const opened = await zoom();
    expect(opened).toBeGreaterThan(1);
    await page.getByRole('group', { name: 'Zoom of the plan' }).getByRole('button', { name: 'Whole room' }).focus();
    await page.keyboard.press('Enter');
    await expect.poll(zoom).toBe(1);
    await plan.focus();
    await page.keyboard.press('+');
    await expect.poll(zoom).toBeCloseTo(1.5, 6);
    await page.getByRole('button', { name: 'Workstation' }).first().click();
    await expect.poll(zoom).toBeCloseTo(opened, 2);
  });

  it('plays and pauses the animation', async () => {
    const time = () => page.getByTestId('frame-time').textContent();
    const start = await time();
    // The radios are visually hidden inside their labels, so click what a user sees.
    await page.locator('label', { hasText: '4×' }).click();
    expect(await page.getByRole('radio', { name: '4×' }).isChecked()).toBe(true);
    await page.getByRole('button', { name: 'Play' }).click();
    await expect.poll(time).not.toBe(start);
    await page.getByRole('button', { name: 'Pause' }).click();
    const paused = await time();
    await page.waitForTimeout(300);
    expect(await time()).toBe(paused);
  });

  it('reruns at half and twice the release jet’s speed and says whether the banner holds', { timeout: 120_000 }, async () => {
    await page.getByRole('button', { name: 'Rerun at ½× and 2× the jet speed' }).click();
    const table = page.getByTestId('jet-sensitivity');
    await table.waitFor({ timeout: 100_000 });
    const rows = await table.locator('tbody tr th').allTextContents();
    expect(rows).toHaveLength(3);
    // The rows' speeds are the run's jet speed scaled by ½, 1 and 2 (shared/physics/release-jets withJetSpeedScaled).
    const speeds = rows.map((r) => Number(/· ([\d.]+) m\/s/.exec(r)![1]));
    expect(speeds[0] / speeds[1]).toBeCloseTo(0.5, 2);
    expect(speeds[2] / speeds[1]).toBeCloseTo(2, 2);
    expect(rows[1]).toMatch(/this run/);
    expect(await page.getByTestId('jet-sensitivity-verdict').textContent()).toMatch(/banner (holds|changes)/);
    await shot(page, 'run-results-jet-sensitivity');
  });

  it('reads the same run as server JSON, and says so when the scenario has no limit', async () => {
    await page.getByLabel('As JSON from the server').check();
    await page.getByLabel('With a limit').uncheck();
    await page.getByLabel('With the hood').uncheck();
    await page.getByRole('button', { name: 'Compute' }).click();
    await expect.poll(() => page.getByRole('note').textContent()).toMatch(/no exposure limit/);
    expect(await page.getByTestId('banner').count()).toBe(0);
    expect(await page.getByTestId('hood-face').count()).toBe(0);
    await shot(page, 'run-results-no-limit-no-hood');
  });
});
