import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '../../server/db/seed';
import { shot, signIn } from '../helpers/browser';
import { useServerAndBrowser } from '../helpers/e2e-setup';

const env = useServerAndBrowser();
const engineer = DEMO_PEOPLE.find((p) => p.role === 'engineer')!;

async function open(): Promise<Page> {
  const page = await env.browser.newPage();
  if (!(await page.context().cookies()).some((c) => c.name === 'motewalk.sid')) {
    await signIn(page, env.server.url, engineer.email, engineer.password);
    await page.waitForURL(/\/scenarios$/);
  } else {
    await page.goto(`${env.server.url}/scenarios`);
  }
  return page;
}

const post = (page: Page, url: string, body: unknown, method = 'POST') =>
  page.evaluate(
    async ([u, b, m]) => {
      const res = await fetch(u as string, {
        method: m as string,
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify(b),
      });
      return { status: res.status, body: await res.json() };
    },
    [url, body, method] as const,
  );

describe('stored markup is shown as text, never run', () => {
  it('renders script and image-handler names inertly in lists and pages', async () => {
    const page = await open();
    const site = await post(page, '/api/sites', {
      name: '<img src=x onerror="window.__pwned=1">',
      data: { address: '<script>window.__pwned=2</script>' },
    });
    expect(site.status).toBe(201);
    const list = await page.evaluate(async () => (await (await fetch('/api/scenarios?pageSize=1')).json()).items[0].id as number);
    const detail = await page.evaluate(async (id) => (await (await fetch(`/api/scenarios/${id}`)).json()) as { version: number }, list);
    const renamed = await post(
      page,
      `/api/scenarios/${list}`,
      { version: detail.version, name: '<script>window.__pwned=3</script>' },
      'PATCH',
    );
    expect(renamed.status).toBe(200);
    await page.goto(`${env.server.url}/places`);
    await page.getByText('<img src=x onerror="window.__pwned=1">').first().waitFor();
    await page.goto(`${env.server.url}/scenarios`);
    await page.getByRole('link', { name: '<script>window.__pwned=3</script>' }).waitFor();
    await page.goto(`${env.server.url}/scenarios/${list}`);
    await page.getByRole('heading', { level: 1, name: '<script>window.__pwned=3</script>' }).waitFor();
    expect(await page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined();
    expect(await page.locator('img[src="x"]').count()).toBe(0);
    await shot(page, 'security-inert-markup');
    await page.close();
  });
});

describe('two people editing one scenario', () => {
  it('answers the second save with the conflict, shows both versions and loses nothing typed', async () => {
    const a = await open();
    const b = await open();
    const id = await a.evaluate(
      async () => (await (await fetch('/api/scenarios?sort=name&order=asc&pageSize=1')).json()).items[0].id as number,
    );
    await a.goto(`${env.server.url}/scenarios/${id}`);
    await b.goto(`${env.server.url}/scenarios/${id}`);
    await a.getByLabel('Scenario name').fill('Renamed in tab A');
    await b.getByLabel('Scenario name').fill('Renamed in tab B');
    await a.getByRole('button', { name: 'Save changes' }).click();
    await a.getByText(/Saved as version/).waitFor();
    await b.getByRole('button', { name: 'Save changes' }).click();
    const conflict = b.getByRole('alert', { name: 'Edit conflict' });
    await conflict.waitFor();
    expect(await conflict.textContent()).toContain('Renamed in tab A');
    expect(await conflict.textContent()).toContain('Renamed in tab B');
    expect(await b.getByLabel('Scenario name').inputValue()).toBe('Renamed in tab B');
    await shot(b, 'security-edit-conflict');
    await conflict.getByRole('button', { name: /Save mine over version/ }).click();
    await b.getByText(/Saved as version/).waitFor();
    const stored = await b.evaluate(async (sid) => (await (await fetch(`/api/scenarios/${sid}`)).json()).name as string, id);
    expect(stored).toBe('Renamed in tab B');
    await a.close();
    await b.close();
  });
});
