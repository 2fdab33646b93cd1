import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '../../server/db/seed';
import type { Page as ApiPage, ScenarioSummary } from '../../shared/schemas/workspace-views';
import { launchBrowser, shot, signIn } from '../helpers/browser';
import { startServer, type RunningServer } from '../helpers/server';

let server: RunningServer;
let browser: BrowserContext;
let page: Page;
let demoId = 0;
let savedId = 0;
let savedName = '';
const engineer = DEMO_PEOPLE.find((p) => p.role === 'engineer')!;

beforeAll(async () => {
  server = await startServer();
  browser = await launchBrowser();
  page = await browser.newPage();
  await signIn(page, server.url, engineer.email, engineer.password);
  await page.waitForURL(/\/scenarios$/);
  const list = (await (await page.request.get(`${server.url}/api/scenarios?pageSize=200`)).json()) as ApiPage<ScenarioSummary>;
  demoId = list.items.find((s) => s.name === 'Flanged hood' && s.workstationName === 'Edge-grinding bench 2')!.id;
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

describe('an engineer sweeps the hood airflow, keeps the best point and prints its report', () => {
  it('sweeps airflow over three points with one progress bar and reads both answers', { timeout: 300_000 }, async () => {
    await page.goto(`${server.url}/scenarios/${demoId}/sweep`);
    const form = page.getByRole('form', { name: 'Sweep settings' });
    await form.getByLabel('Parameter').selectOption({ label: 'Hood airflow' });
    await form.getByLabel('From').fill('300');
    await form.getByLabel('To').fill('2700');
    await form.getByLabel('Number of points').fill('3');
    await form.getByLabel('Particles per point').fill('4000');
    await form.getByRole('button', { name: /Run the sweep \(3 points\)/ }).click();
    await page.getByRole('progressbar', { name: 'Sweep progress' }).waitFor();
    await page.getByText(/of 3 points done/).waitFor();

    const meets = page.getByTestId('sweep-meets');
    await meets.waitFor({ timeout: 240_000 });
    await page.getByTestId('sweep-chart').waitFor();
    expect(await page.getByTestId('sweep-band').count()).toBe(1);
    expect(await page.getByTestId('target-line').count()).toBe(1);
    expect(await meets.innerText()).toMatch(/target \(the upper 95 % bound at or below 50 % of the limit\)/);
    const hand = await page.getByTestId('sweep-hand-calc').innerText();
    // Flanged 0.35 × 0.25 m face, source 0.3 m out, grinding: 2.5 m/s needs 6,666 m³/h by Q = 0.75 V (10 X² + A).
    expect(hand).toContain('Q = 0.75 V (10 X² + A)');
    expect(hand).toContain('2.5 m/s, the low end of the 2.5–10 m/s range');
    expect(hand).toContain('6,666 m³/h');
    expect(await page.getByTestId('sweep-disagreement').innerText()).toMatch(/^Where they differ: /);
    expect(await page.getByRole('row').count()).toBe(4);
    await shot(page, 'sweep');
  });

  it('saves the point with the lowest upper bound as a new scenario and finds it in the list', async () => {
    const table = page.getByRole('table', { name: 'Sweep points' });
    await table.getByRole('button', { name: /Upper 95 %/ }).click();
    await table.getByRole('row').nth(1).getByRole('button', { name: 'Save as new scenario' }).click();
    const link = table.getByRole('link', { name: /^Open “Flanged opening at [\d,]+ m³\/h”$/ });
    await link.waitFor();
    savedName = (await link.innerText()).replace(/^Open “|”$/g, '');
    savedId = Number(/\/scenarios\/(\d+)$/.exec((await link.getAttribute('href'))!)![1]);
    await page.goto(`${server.url}/scenarios`);
    await page.getByRole('cell', { name: savedName }).first().waitFor();
  });

  it('opens the report of the saved point with its inputs and the cautions', async () => {
    await page.goto(`${server.url}/reports/${savedId}`);
    const report = page.getByRole('article', { name: `Report: ${savedName}` });
    await report.waitFor();
    for (const heading of ['1. Inputs', '2. Assumptions, the model and its limits', '3. Results', '4. Approval and sign-off'])
      await report.getByRole('heading', { name: heading }).waitFor();
    expect(await report.getByRole('cell', { name: savedName.replace('Flanged opening at ', '') }).count()).toBe(1);
    expect(await report.getByText('Respirable crystalline silica').count()).toBeGreaterThan(0);
    expect(await report.getByText(/no saved run yet/).count()).toBe(1);
    await report.getByRole('complementary', { name: 'Cautions' }).waitFor();
    expect(await report.getByText('Combustible dust (explosion risk) is not assessed.').count()).toBe(1);
    await report.getByRole('button', { name: 'Print or save as PDF' }).waitFor();
    await shot(page, 'report');
  });

  it('prints the demo report with its run as a clean document', async () => {
    await page.goto(`${server.url}/reports/${demoId}`);
    const report = page.getByRole('article', { name: 'Report: Flanged hood' });
    await report.getByTestId('twa').waitFor();
    expect(await report.getByText('Assessed by').count()).toBe(1);
    expect(await report.getByRole('complementary', { name: 'Cautions' }).count()).toBe(1);
    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false);
    expect(await report.getByRole('button', { name: 'Print or save as PDF' }).isVisible()).toBe(false);
    await shot(page, 'report-print');
    await page.emulateMedia({ media: 'screen' });
  });
});
