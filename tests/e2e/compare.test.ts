import fs from 'node:fs';
import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '../../server/db/seed';
import { launchBrowser, shot, signIn } from '../helpers/browser';
import { startServer, type RunningServer } from '../helpers/server';

let server: RunningServer;
let browser: BrowserContext;

beforeAll(async () => {
  server = await startServer();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const BENCH = 'Edge-grinding bench 2';
const viewer = DEMO_PEOPLE.find((p) => p.role === 'viewer')!;

// Quoted fields may hold commas; split only on commas outside quotes.
const csvRows = (text: string) =>
  text
    .trim()
    .split('\r\n')
    .map((line) => line.split(/,(?=(?:[^"]*"[^"]*")*[^"]*$)/).map((c) => c.replace(/^"|"$/g, '')));

describe('side by side', () => {
  it('lets a viewer compare three options at the stone bench, share the link and download the CSV', async () => {
    const page = await browser.newPage();
    await signIn(page, server.url, viewer.email, viewer.password);
    await page.waitForURL(/\/scenarios$/);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Side by side' }).click();
    await page.getByText('Choose scenarios to compare').waitFor();

    await page.getByLabel('Search scenarios').fill('edge-grinding');
    for (const name of ['No control', 'Slot hood', 'Flanged hood'])
      await page.getByRole('checkbox', { name: `${name} at ${BENCH}` }).check();

    const list = await page.evaluate(() => fetch('/api/scenarios?pageSize=200').then((r) => r.json()));
    const benchIds = (list.items as { id: number; workstationName: string }[]).filter((s) => s.workstationName === BENCH).map((s) => s.id);
    await expect.poll(() => new URL(page.url()).searchParams.get('ids')?.split(',').map(Number).sort()).toEqual([...benchIds].sort());

    const headers = page.getByTestId('compare-column');
    await expect.poll(() => headers.count(), { timeout: 30_000 }).toBe(3);
    // Engineering controls come before no control; the two hoods tie on tier and go by name.
    // Polled: a column's header text settles once its run has loaded.
    await expect
      .poll(async () =>
        (await headers.allTextContents()).map((t) => t.replace(/^✓ Meets the target with the least airflow/, '').replace(/run of.*$/, '')),
      )
      .toEqual(['Flanged hood', 'Slot hood', 'No control']);

    const banners = page.getByRole('row', { name: /^Banner/ }).getByRole('cell');
    await expect.poll(() => banners.count()).toBe(3);
    for (const text of await banners.allTextContents()) expect(text).toMatch(/Clear|Watch|Act/);
    expect(await banners.nth(2).textContent()).toMatch(/Act/);

    await expect.poll(() => page.getByText(/differs \(z = [\d.]+\)/).count()).toBeGreaterThan(0);
    // Engine 2.0: the grinder's jet carries dust past both hoods, each below half the capture velocity grinding
    // needs, and no control is Act, so none meets the target (shared verdict): the table says why for each.
    expect(await headers.filter({ hasText: 'Meets the target with the least airflow' }).count()).toBe(0);
    expect(await page.getByText('None of these options meets the target on its verdict.').count()).toBe(1);
    const target = page.getByRole('row', { name: /^Meets the target/ }).getByRole('cell');
    expect(await target.nth(0).textContent()).toMatch(/below half its capture velocity|not decided: run more particles|above the target/);
    expect(await target.nth(2).textContent()).toMatch(/above the target/);
    expect(await page.getByTestId('compare-series').count()).toBe(3);

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download CSV' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^side-by-side-[\d-]+\.csv$/);
    const [header, ...rows] = csvRows(fs.readFileSync((await download.path())!, 'utf8'));
    expect(header.slice(0, 2)).toEqual(['Scenario', 'Workstation']);
    expect(header).toContain('Respirable 8-h TWA (mg/m³)');
    expect(header).toContain('Beyond statistical error');
    expect(rows.map((r) => r[0])).toEqual(['Flanged hood', 'Slot hood', 'No control']);
    for (const row of rows) {
      expect(row).toHaveLength(header.length);
      expect(row[1]).toBe(BENCH);
    }
    await shot(page, 'compare');

    // The link alone reopens the same comparison.
    const shared = page.url();
    const other = await browser.newPage();
    await other.goto(shared);
    await expect.poll(() => other.getByTestId('compare-column').count(), { timeout: 30_000 }).toBe(3);
    await other.close();
    await page.close();
  });

  it('refuses more than four scenarios in a link and says why', async () => {
    const page = await browser.newPage();
    await signIn(page, server.url, viewer.email, viewer.password);
    await page.waitForURL(/\/scenarios$/);
    await page.goto(`${server.url}/side-by-side?ids=1,2,3,4,5`);
    await expect.poll(() => page.getByRole('alert').filter({ hasText: 'Too many scenarios' }).count()).toBe(1);
    expect(await page.getByTestId('compare-column').count()).toBe(0);
    await page.close();
  });
});
