import type { AddressInfo } from 'node:net';
import path from 'node:path';
import type { BrowserContext, Locator, Page } from 'playwright-core';
import { createServer, type ViteDevServer } from 'vite';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, SCREENSHOTS, shot } from '../helpers/browser';

let vite: ViteDevServer;
let browser: BrowserContext;
let page: Page;
let url: string;

const fieldValue = async (label: string) => Number(await page.getByLabel(label, { exact: true }).inputValue());

// The focus ring sits on the marker's own position, unlike the group's box, which includes its label and arrow.
async function markerCentre(marker: Locator) {
  const box = await marker.locator('rect').first().boundingBox();
  if (!box) throw new Error('marker is not visible');
  return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
}

// A close-up of the drawings: the full-page shot is too tall to read them at a glance.
const closeUp = (name: string) => page.locator('[aria-label="Room drawings"]').screenshot({ path: path.join(SCREENSHOTS, `${name}.png`) });

beforeAll(async () => {
  vite = await createServer({ configFile: 'vite.config.ts', server: { port: 0 }, logLevel: 'warn' });
  await vite.listen();
  const { port } = vite.httpServer!.address() as AddressInfo;
  url = `http://localhost:${port}/features/scenario-editor/dev/preview.html`;
  browser = await launchBrowser();
  page = await browser.newPage();
  await page.goto(url, { waitUntil: 'networkidle' });
  await page.getByTestId('plan-view').waitFor();
});
afterAll(async () => {
  await browser?.close();
  await vite?.close();
});

describe('the scenario editor preview', () => {
  it('draws the plan and elevation with every marker and a clean validation', async () => {
    for (const view of ['plan-view', 'elevation-view']) {
      for (const id of ['drag-source', 'drag-hood-0', 'drag-worker']) await page.getByTestId(view).getByTestId(id).waitFor();
    }
    await expect.poll(() => page.getByTestId('validation-summary').textContent()).toMatch(/Ready to run/);
    expect(await page.getByTestId('hood-verdict-0').textContent()).toMatch(/≈ .* m\/s at the source/);
    await shot(page, 'scenario-editor-1280');
    await closeUp('scenario-editor-1280-drawings');
    await page
      .getByRole('group', { name: 'Controls', exact: true })
      .screenshot({ path: path.join(SCREENSHOTS, 'scenario-editor-1280-controls.png') });
  });

  it('moves the hood by whole 5 cm steps when it is dragged in the plan', async () => {
    const before = await fieldValue('Face centre x');
    const hood = page.getByTestId('plan-view').getByTestId('drag-hood-0');
    const start = await markerCentre(hood);
    await page.mouse.move(start.x, start.y);
    await page.mouse.down();
    await page.mouse.move(start.x - 20, start.y + 4, { steps: 4 });
    await page.mouse.move(start.x - 43, start.y + 9, { steps: 4 });
    await page.mouse.up();
    const after = await fieldValue('Face centre x');
    const steps = (after - before) / 0.05;
    expect(after).toBeLessThan(before);
    expect(Math.abs(steps - Math.round(steps))).toBeLessThan(1e-6);
    expect(await hood.getAttribute('aria-label')).toContain(`x ${after.toFixed(2)} m`);
  });

  it('nudges the worker 5 cm along x with the arrow key', async () => {
    const before = await fieldValue('Nose and mouth x');
    const worker = page.getByTestId('plan-view').getByTestId('drag-worker');
    await worker.focus();
    await page.keyboard.press('ArrowRight');
    expect(await fieldValue('Nose and mouth x')).toBeCloseTo(before + 0.05, 9);
    await closeUp('scenario-editor-1280-focus');
  });

  it('gives the source a release type and its default jet, aimed at the breathing zone, which the engineer can override', async () => {
    const source = page.getByRole('group', { name: 'Source and emission', exact: true });
    expect(await source.getByLabel('How the dust is released').inputValue()).toBe('low');
    expect(await page.getByTestId('jet-default').textContent()).toMatch(/0\.70? m\/s from a 100 mm stream, aimed at the breathing zone/);
    await source.getByLabel('Use the default jet for this release type').uncheck();
    // Unticked, the fields start from the default itself (0.7 m/s, 100 mm), aimed at the worker to a tenth of a degree: tilt = atan(rise / run) [C].
    expect(await fieldValue('Jet speed')).toBeCloseTo(0.7, 9);
    expect(await fieldValue('Jet diameter')).toBeCloseTo(100, 9);
    const run_m = Math.hypot(
      (await fieldValue('Nose and mouth x')) - (await fieldValue('Source x')),
      (await fieldValue('Nose and mouth y')) - (await fieldValue('Source y')),
    );
    const rise_m = (await fieldValue('Nose and mouth height')) - (await fieldValue('Release height'));
    expect(Math.abs((await fieldValue('Jet tilt')) - (Math.atan2(rise_m, run_m) * 180) / Math.PI)).toBeLessThanOrEqual(0.05);
    await page.getByLabel('Jet speed', { exact: true }).fill('150');
    await expect.poll(() => page.getByLabel('Jet speed', { exact: true }).getAttribute('aria-invalid')).toBe('true');
    await page.getByLabel('Jet speed', { exact: true }).fill('6');
    await source.getByLabel('How the dust is released').selectOption('high');
    await expect
      .poll(async () => JSON.parse((await page.getByTestId('scenario-json').textContent()) ?? '{}').source)
      .toMatchObject({ releaseType: 'high', jet: { speed_mPerS: 6, diameter_m: 0.1 } });
    expect(await page.getByTestId('hood-verdict-0').textContent()).toMatch(/2\.5–10 m\/s capture range/);
    await source.screenshot({ path: path.join(SCREENSHOTS, 'scenario-editor-1280-source.png') });
    await source.getByLabel('Use the default jet for this release type').check();
    await expect.poll(async () => JSON.parse((await page.getByTestId('scenario-json').textContent()) ?? '{}').source.jet).toBeUndefined();
  });

  it('shows the error at the airflow field when the airflow is impossible', async () => {
    const airflow = page.getByLabel('Airflow', { exact: true });
    await airflow.fill('-300');
    await expect.poll(() => airflow.getAttribute('aria-invalid')).toBe('true');
    const describedBy = await airflow.getAttribute('aria-describedby');
    expect(await page.locator(`[id="${describedBy}"]`).textContent()).toMatch(/Must be at least 0/);
    expect(await page.getByTestId('validation-summary').textContent()).toMatch(/One field needs attention/);
    await shot(page, 'scenario-editor-1280-error');
  });

  it('stacks the drawings above the form on a tablet', async () => {
    await page.setViewportSize({ width: 768, height: 1024 });
    const plan = await page.getByTestId('plan-view').boundingBox();
    const form = await page.getByRole('form', { name: 'Scenario' }).boundingBox();
    expect(plan!.y + plan!.height).toBeLessThan(form!.y);
    await shot(page, 'scenario-editor-768');
  });

  it('disables every field and marker for viewers', async () => {
    await page.goto(`${url}?readonly`, { waitUntil: 'networkidle' });
    await page.getByTestId('plan-view').waitFor();
    expect(await page.getByLabel('Face centre x', { exact: true }).isDisabled()).toBe(true);
    expect(await page.getByTestId('plan-view').getByTestId('drag-hood-0').getAttribute('tabindex')).toBe('-1');
    await page.setViewportSize({ width: 1280, height: 860 });
  });
});
