import type { Locator, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '../../server/db/seed';
import { shot, signIn } from '../helpers/browser';
import { useServerAndBrowser } from '../helpers/e2e-setup';
import { PHONE, drawings, expectFirstColumnsInView, outside, scrollTablesSideways, sideways, tabThrough } from '../helpers/phone-layout';

// A small demo run keeps seeding quick; the drawings and tables do not depend on the particle count.
const env = useServerAndBrowser({ DEMO_PARTICLES: '2000' });
const engineer = DEMO_PEOPLE.find((p) => p.role === 'engineer')!;

async function phonePage(): Promise<Page> {
  const page = await env.browser.newPage();
  await page.setViewportSize(PHONE);
  await signIn(page, env.server.url, engineer.email, engineer.password);
  await page.waitForURL(/\/scenarios$/);
  return page;
}

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
    // The cross-checks' sentences keep a readable width and scroll with their table instead of standing a word per line.
    const assumes = page.getByRole('table', { name: /beside the analytic models$/ }).getByRole('columnheader', { name: 'What it assumes' });
    expect((await assumes.boundingBox())!.width).toBeGreaterThanOrEqual(250);
    await map.scrollIntoViewIfNeeded();
    await shot(page, 'phone-results');
    await page.close();
  });

  it('the report keeps its tables in their boxes with the first column in view and draws every figure to the width', async () => {
    const page = await phonePage();
    await page.goto(`${env.server.url}/reports/3`);
    const report = page.getByRole('article', { name: /^Report: / });
    await report.getByTestId('twa').waitFor();
    await report.getByRole('group', { name: /^Capture-velocity map/ }).waitFor();
    expect(await sideways(page)).toBe(0);
    expect(await outside(report, 'select, button')).toEqual([]);

    const tables = await scrollTablesSideways(report);
    expectFirstColumnsInView(tables);
    // The hoods table and the table of fractions are wider than a phone: they really did scroll.
    expect(tables.find((t) => t.name === 'Hoods')?.overflows).toBe(true);
    expect(tables.filter((t) => t.overflows).length).toBeGreaterThanOrEqual(2);
    expect(await sideways(page)).toBe(0);

    const figures = await drawings(report);
    // The time chart, the plan, the elevation and both maps at least.
    expect(figures.length).toBeGreaterThanOrEqual(5);
    for (const f of figures) {
      expect(f.left, f.name).toBeGreaterThanOrEqual(0);
      expect(f.right, f.name).toBeLessThanOrEqual(PHONE.width);
      expect(Math.abs(f.width - f.room), f.name).toBeLessThan(1);
      expect(Math.abs(f.stretch - 1), f.name).toBeLessThan(0.02);
    }
    await report.getByRole('table', { name: 'Hoods' }).locator('..').screenshot({ path: 'tests/e2e/screenshots/phone-report-hoods.png' });
    await shot(page, 'phone-report');
    await page.close();
  });

  it('the places screens fit with each edit form open and tab through on screen', async () => {
    const page = await phonePage();
    await page.goto(`${env.server.url}/places`);
    await page.getByRole('heading', { name: 'Sites and workstations' }).waitFor();
    expect(await sideways(page)).toBe(0);
    for (const form of ['New site', 'New room', 'New workstation'])
      expect(await outside(page.getByRole('form', { name: form })), form).toEqual([]);

    // One edit form is open at a time; the workstation's, with the longest choices, is left open for the picture.
    for (const [kind, name] of [
      ['site', 'Harrowgate Stoneworks'],
      ['room', 'Fabrication hall'],
      ['workstation', 'Edge-grinding bench 2'],
    ]) {
      await page.getByRole('button', { name: `Edit ${kind} ${name}`, exact: true }).click();
      const form = page.getByRole('form', { name: `Edit ${kind} ${name}` });
      await form.waitFor();
      expect(await sideways(page), kind).toBe(0);
      expect(await outside(form), kind).toEqual([]);
      await tabThrough(page, form, 'Save changes');
    }
    expect(await sideways(page)).toBe(0);
    await shot(page, 'phone-places');

    // A workstation's page lists its options in a table that scrolls in its box.
    const scenario = await page.evaluate(async () => (await (await fetch('/api/scenarios/3')).json()) as { workstationId: number });
    await page.goto(`${env.server.url}/workstations/${scenario.workstationId}`);
    const main = page.locator('main');
    await main.getByRole('table').first().waitFor();
    expect(await sideways(page)).toBe(0);
    const tables = await scrollTablesSideways(main);
    expectFirstColumnsInView(tables);
    expect(tables.some((t) => t.overflows)).toBe(true);
    expect(await sideways(page)).toBe(0);
    await shot(page, 'phone-workstation');
    await page.close();
  });

  it('the edit-conflict panels keep yours and the stored version inside them', async () => {
    const a = await phonePage();
    const b = await phonePage();

    // A workstation saved in one tab while the other edits it.
    const editWorkstation = async (page: Page) => {
      await page.goto(`${env.server.url}/places`);
      await page.getByRole('button', { name: 'Edit workstation Edge-grinding bench 2', exact: true }).click();
      return page.getByRole('form', { name: 'Edit workstation Edge-grinding bench 2' });
    };
    const formA = await editWorkstation(a);
    const formB = await editWorkstation(b);
    await formA.getByLabel('What happens here').fill('Edges ground dry with a hand-held grinder.');
    await formB.getByLabel('What happens here').fill('Hand-held angle grinder on countertop edges, dry, with the dust shroud taken off.');
    await formB.getByLabel('Source x').fill('3.4');
    await formA.getByRole('button', { name: 'Save changes' }).click();
    await formA.waitFor({ state: 'detached' });
    await formB.getByRole('button', { name: 'Save changes' }).click();
    const placeConflict = formB.getByRole('alert', { name: 'Edit conflict' });
    await placeConflict.waitFor();
    await placeConflict.scrollIntoViewIfNeeded();
    expect(await sideways(b)).toBe(0);
    expect(await outside(placeConflict, 'button')).toEqual([]);
    const tables = await scrollTablesSideways(placeConflict);
    expect(tables).toHaveLength(1);
    expectFirstColumnsInView(tables);
    // Yours and the stored version side by side are wider than the panel on a phone: they scroll within it.
    expect(tables[0].overflows).toBe(true);
    expect(await sideways(b)).toBe(0);
    await placeConflict.screenshot({ path: 'tests/e2e/screenshots/phone-conflict-place.png' });
    await shot(b, 'phone-conflict-place-page');

    // A scenario saved in one tab while the other edits it; a changed hood comes as one long line without spaces, wrapped inside the list.
    for (const page of [a, b]) {
      await page.goto(`${env.server.url}/scenarios/2`);
      await page.getByLabel('Scenario name').waitFor();
    }
    await a.getByLabel('Scenario name').fill('Slot hood (checked)');
    await b.getByLabel('Scenario name').fill('Slot hood, fan turned up');
    await b.getByLabel('Airflow', { exact: true }).first().fill('1500');
    await a.getByRole('button', { name: 'Save changes' }).click();
    await a.getByText(/Saved as version/).waitFor();
    await b.getByRole('button', { name: 'Save changes' }).click();
    const scenarioConflict = b.getByRole('alert', { name: 'Edit conflict' });
    await scenarioConflict.waitFor();
    await scenarioConflict.scrollIntoViewIfNeeded();
    expect(await sideways(b)).toBe(0);
    expect(await outside(scenarioConflict, 'button, ul')).toEqual([]);
    const list = scenarioConflict.getByRole('list');
    expect(await list.textContent()).toMatch(/hoods: yours \[\{.*\S{100,}/);
    expect(await list.evaluate((ul) => ul.scrollWidth - ul.clientWidth)).toBe(0);
    await scenarioConflict.screenshot({ path: 'tests/e2e/screenshots/phone-conflict-scenario.png' });
    await a.close();
    await b.close();
  });
});
