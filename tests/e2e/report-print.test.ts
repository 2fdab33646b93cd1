import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '../../server/db/seed';
import type { Page as ApiPage, ScenarioSummary } from '../../shared/schemas/workspace-views';
import { shot, signIn } from '../helpers/browser';
import { useServerAndBrowser } from '../helpers/e2e-setup';
import { pdfPageTexts } from '../helpers/pdf-text';

const ctx = useServerAndBrowser();
const viewer = DEMO_PEOPLE.find((p) => p.role === 'viewer')!;

async function printReport(page: Page, scenario: string, workstation: string) {
  const list = (await (await page.request.get(`${ctx.server.url}/api/scenarios?pageSize=200`)).json()) as ApiPage<ScenarioSummary>;
  const id = list.items.find((s) => s.name === scenario && s.workstationName === workstation)!.id;
  await page.goto(`${ctx.server.url}/reports/${id}`);
  await page
    .getByRole('article', { name: `Report: ${scenario}` })
    .getByTestId('twa')
    .waitFor();
  return pdfPageTexts(new Uint8Array(await page.pdf({ format: 'A4', printBackground: true })));
}

// What a screen offers to click, type or sort; none of it means anything on paper.
const CONTROL_LABELS = [
  'Print or save as PDF',
  'Run reported',
  'open the scenario',
  'Download CSV',
  'Download time series CSV',
  'Select a column heading to sort',
  'Pause',
  'Speed',
  '0.5×',
  'Frame',
  '↕',
];

describe('the printed report', () => {
  it('prints to a few full pages with every table heading and no screen controls', { timeout: 180_000 }, async () => {
    const page = await ctx.browser.newPage();
    await signIn(page, ctx.server.url, viewer.email, viewer.password);
    await page.waitForURL(/\/scenarios$/);
    const pages = await printReport(page, 'No control', 'Edge-grinding bench 2');
    // A heading wrapped at its hyphen ("Monte-" / "Carlo") comes out of the PDF as two pieces.
    const all = pages.join('\n').replace(/(\w)- (\w)/g, '$1-$2');

    for (const heading of [
      // The sticky first column ("Fraction") is drawn after the others, so the PDF's text gives it last.
      'Task mean (mg/m³, 95 % CI) 8-h TWA (mg/m³, 95 % CI) Peak 15-min average (mg/m³, 95 % CI) % of limit (upper 95 %) Fraction',
      'Fate Share (%) Mass (mg)',
      'Concentration (mg/m³) Monte-Carlo ÷ model What it assumes',
    ])
      expect(all).toContain(heading);
    for (const label of CONTROL_LABELS) expect(all).not.toContain(label);
    // Without a play button, paper gets every recorded path instead of one frame of the animation.
    expect(all).toMatch(/On paper: the whole paths of the \d+ sampled particles over the \d+ min run/);
    // Eleven half-empty pages before; the sections now flow and only their parts are kept whole. The
    // report has grown since (the day-to-day GSD, peaks with intervals, what the model assumed) to nine,
    // and no page holds only a stray line: the sign-off stays whole with its heading.
    expect(pages.length).toBeLessThanOrEqual(9);
    for (const text of pages) expect(text.trim().length).toBeGreaterThan(100);
    expect(pages.at(-1)).toMatch(/Approval and sign-off[\s\S]*Signature/);

    // A table split over two pages starts again with its headings on the second.
    for (const [n, text] of pages.entries())
      if (/Respirable \d/.test(text) && !/Task mean \(mg/.test(text) && /Thoracic \d/.test(pages[n - 1] ?? ''))
        expect(text).toContain('Task mean (mg/m³, 95 % CI)');

    await page.emulateMedia({ media: 'print' });
    expect(await page.getByTestId('paths-plan').locator('polyline').count()).toBeGreaterThan(50);
    await shot(page, 'report-print-paths');
    await page.close();
  });
});
