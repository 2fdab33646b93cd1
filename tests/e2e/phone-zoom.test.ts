import type { Locator, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '../../server/db/seed';
import { shot, signIn } from '../helpers/browser';
import { useServerAndBrowser } from '../helpers/e2e-setup';

// A small demo run keeps seeding quick; the drawings and tables do not depend on the particle count.
const env = useServerAndBrowser({ DEMO_PARTICLES: '2000' });
const engineer = DEMO_PEOPLE.find((p) => p.role === 'engineer')!;
// 390 px is a common phone width (common practice for mobile layouts).
const PHONE = { width: 390, height: 844 };

async function phonePage(): Promise<Page> {
  const page = await env.browser.newPage();
  await page.setViewportSize(PHONE);
  await signIn(page, env.server.url, engineer.email, engineer.password);
  await page.waitForURL(/\/scenarios$/);
  return page;
}

const sideways = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);

async function centre(marker: Locator) {
  const box = (await marker.locator('rect').first().boundingBox())!;
  return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
}

async function dragRight(page: Page, marker: Locator, px: number) {
  const start = await centre(marker);
  await page.mouse.move(start.x, start.y);
  await page.mouse.down();
  await page.mouse.move(start.x + px / 2, start.y, { steps: 3 });
  await page.mouse.move(start.x + px, start.y, { steps: 3 });
  await page.mouse.up();
}

describe('on a 390 px phone', () => {
  it('the editor does not scroll sideways, opens its plan on the workstation and drags finely once zoomed in', async () => {
    const page = await phonePage();
    await page.goto(`${env.server.url}/scenarios/3`);
    const plan = page.getByTestId('plan-view');
    await plan.waitFor();
    expect(await sideways(page)).toBe(0);
    const zoom = async () => Number(await plan.getAttribute('data-zoom'));
    expect(await zoom()).toBeGreaterThan(1);
    await shot(page, 'phone-editor');

    const x = page.getByLabel('Nose and mouth x', { exact: true });
    const worker = plan.getByTestId('drag-worker');
    await page.getByRole('group', { name: 'Zoom of the plan' }).getByRole('button', { name: 'Whole room' }).click();
    await expect.poll(zoom).toBe(1);
    let before = Number(await x.inputValue());
    await dragRight(page, worker, 12);
    const coarse = Number(await x.inputValue()) - before;
    expect(coarse).toBeGreaterThanOrEqual(0.1);

    // Ctrl + wheel zooms about the pointer: the worker stays under it.
    const at = await centre(worker);
    await page.mouse.move(at.x, at.y);
    await page.keyboard.down('Control');
    for (let i = 0; i < 14; i++) await page.mouse.wheel(0, -100);
    await page.keyboard.up('Control');
    await expect.poll(zoom).toBeGreaterThan(10);
    const still = await centre(worker);
    expect(Math.abs(still.x - at.x)).toBeLessThan(3);
    expect(Math.abs(still.y - at.y)).toBeLessThan(3);
    before = Number(await x.inputValue());
    await dragRight(page, worker, 12);
    const fine = Number(await x.inputValue()) - before;
    expect(fine).toBeGreaterThan(0);
    expect(fine).toBeLessThanOrEqual(0.03);
    expect(Math.abs(fine * 100 - Math.round(fine * 100))).toBeLessThan(1e-6);
    expect(await sideways(page)).toBe(0);
    await plan.screenshot({ path: 'tests/e2e/screenshots/phone-editor-plan-zoomed.png' });

    // The saved-runs table scrolls inside its box and keeps the column that names each run in view.
    const table = page.getByRole('table').first();
    await table.scrollIntoViewIfNeeded();
    const first = table.locator('tbody tr').first().locator('td').first();
    const left = (await first.boundingBox())!.x;
    await table.evaluate((t) => (t.parentElement!.scrollLeft = 400));
    expect(await table.evaluate((t) => t.parentElement!.scrollLeft)).toBeGreaterThan(0);
    expect(Math.abs((await first.boundingBox())!.x - left)).toBeLessThan(1);
    expect(await sideways(page)).toBe(0);
    await shot(page, 'phone-editor-table');
    await page.close();
  });

  it('the results page does not scroll sideways and its capture-velocity map zooms from the keyboard', async () => {
    const page = await phonePage();
    await page.goto(`${env.server.url}/runs/3`);
    await page.getByRole('heading', { name: 'Particle paths, plan and elevation' }).waitFor();
    expect(await sideways(page)).toBe(0);
    const zoomIn = page.getByRole('button', { name: 'Zoom in on the capture-velocity map' });
    const map = page.getByRole('group', { name: /^Capture-velocity map/ });
    const before = Number(await map.getAttribute('data-zoom'));
    await zoomIn.focus();
    await page.keyboard.press('Enter');
    await expect.poll(async () => Number(await map.getAttribute('data-zoom'))).toBeCloseTo(before * 1.5, 1);
    expect(await sideways(page)).toBe(0);
    await map.scrollIntoViewIfNeeded();
    await shot(page, 'phone-results');
    await page.close();
  });
});
