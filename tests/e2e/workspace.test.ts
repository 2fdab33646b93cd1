import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '../../server/db/seed';
import { shot, signIn } from '../helpers/browser';
import { useServerAndBrowser } from '../helpers/e2e-setup';

const env = useServerAndBrowser();
let runUrl = '';
let scenarioUrl = '';
const person = (role: string) => DEMO_PEOPLE.find((p) => p.role === role)!;

async function asEngineer(): Promise<Page> {
  const page = await env.browser.newPage();
  await signIn(page, env.server.url, person('engineer').email, person('engineer').password);
  await page.waitForURL(/\/scenarios$/);
  return page;
}

describe('an engineer builds, runs and saves a scenario; a viewer reads it', () => {
  it('uploads a cascade-impactor size profile and sees its fitted MMAD', async () => {
    const page = await asEngineer();
    await page.getByRole('link', { name: 'Size profiles' }).click();
    const form = page.getByRole('form', { name: 'Upload a size profile' });
    await form.getByLabel('Format').selectOption('impactor');
    await form.getByLabel('Name').fill('Bench 2 impactor, week 14');
    await form.getByLabel('CSV file').setInputFiles(path.resolve('tests/fixtures/uploads/impactor-stages.csv'));
    await form.getByRole('button', { name: 'Upload and fit' }).click();
    await page.getByText('Stored “Bench 2 impactor, week 14”.').waitFor();
    await expect.poll(() => page.getByRole('cell', { name: /Bench 2 impactor, week 14/ }).count()).toBeGreaterThan(0);
    await shot(page, 'workspace-size-profiles');
    await page.close();
  });

  it('adds an option at the stone bench, drags the hood in the plan view, saves, runs with progress and saves the run', async () => {
    const page = await asEngineer();
    await page.getByRole('link', { name: 'Workstations' }).click();
    // The scenario list stays on screen while the next page loads, and it links the bench once per scenario.
    await page.getByRole('heading', { name: 'Sites and workstations' }).waitFor();
    await page.getByRole('link', { name: 'Edge-grinding bench 2' }).click();
    await page.getByRole('button', { name: 'Add an option' }).click();
    await page.waitForURL(/\/scenarios\/\d+$/);
    scenarioUrl = page.url();

    await page.getByLabel('Scenario name').fill('Slot hood, dragged closer');
    await page.getByLabel('Dust agent').selectOption({ label: 'Respirable crystalline silica' });
    await page.getByLabel('Size profile').selectOption({ label: 'Bench 2 impactor, week 14' });
    await page.getByRole('button', { name: /Add hood/ }).click();
    const hoodX = page.getByLabel('Face centre x');
    const before = Number(await hoodX.inputValue());

    const handle = page.getByTestId('plan-view').getByTestId('drag-hood-0');
    const box = (await handle.locator('rect').first().boundingBox())!;
    const start = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
    await page.mouse.move(start.x, start.y);
    await page.mouse.down();
    await page.mouse.move(start.x - 20, start.y + 4, { steps: 4 });
    await page.mouse.move(start.x - 43, start.y + 9, { steps: 4 });
    await page.mouse.up();
    const after = Number(await hoodX.inputValue());
    expect(after).not.toBe(before);
    expect(Math.abs(Math.round(after * 100) % 5)).toBe(0);

    await page.getByLabel('Particles').fill('6000');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText(/Saved as version 2/).waitFor();
    await shot(page, 'workspace-editor');

    await page.getByRole('button', { name: /^▶ Run/ }).click();
    await page.getByRole('progressbar', { name: 'Simulation progress' }).waitFor();
    await shot(page, 'workspace-running');
    await page.getByRole('button', { name: 'Save this run' }).click({ timeout: 90_000 });
    await page.getByText('✓ Run saved').waitFor();
    await page.reload();
    const link = page.getByRole('table', { name: 'Saved runs' }).getByRole('link').first();
    await link.waitFor();
    runUrl = new URL((await link.getAttribute('href'))!, env.server.url).toString();
    await shot(page, 'workspace-scenario-saved');
    await page.close();
  });

  it('lets a viewer open the saved run without re-running and refuses edits', async () => {
    const page = await env.browser.newPage();
    await signIn(page, env.server.url, person('viewer').email, person('viewer').password);
    await page.waitForURL(/\/scenarios$/);
    await page.goto(runUrl);
    await page.getByRole('heading', { name: /Run of “Slot hood, dragged closer”/ }).waitFor();
    await expect.poll(() => page.getByText(/8-h TWA/).count()).toBeGreaterThan(0);
    await shot(page, 'workspace-viewer-run');

    await page.goto(scenarioUrl);
    await page.getByText(/only engineers change or run it/).waitFor();
    expect(await page.getByRole('button', { name: 'Save changes' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^▶ Run/ }).count()).toBe(0);
    expect(await page.getByLabel('Face centre x').isDisabled()).toBe(true);
    const status = await page.evaluate(async (url) => {
      const id = Number(url.split('/').pop());
      const res = await fetch(`/api/scenarios/${id}`, {
        method: 'PATCH',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ version: 2, name: 'viewer edit' }),
      });
      return res.status;
    }, scenarioUrl);
    expect(status).toBe(403);
    await page.close();
  });

  it('adds a site, a room and a workstation through the forms, refusing a workstation outside its room', async () => {
    const page = await asEngineer();
    await page.getByRole('link', { name: 'Workstations' }).click();
    const site = page.getByRole('form', { name: 'New site' });
    await site.getByLabel('Site name').fill('Fenwick Tile Works');
    await site.getByRole('button', { name: 'Add site' }).click();
    await page.getByText('Site “Fenwick Tile Works” added.').waitFor();
    const room = page.getByRole('form', { name: 'New room' });
    await room.getByLabel('Site').selectOption({ label: 'Fenwick Tile Works' });
    await room.getByLabel('Room name').fill('Cutting shed');
    await room.getByRole('button', { name: 'Add room' }).click();
    await page.getByText('Room “Cutting shed” added.').waitFor();
    const ws = page.getByRole('form', { name: 'New workstation' });
    await ws.getByLabel('Room').selectOption({ label: 'Cutting shed (Fenwick Tile Works)' });
    await ws.getByLabel('Workstation name').fill('Wet saw');
    await ws.getByLabel('Nose/mouth x').fill('30');
    await ws.getByRole('button', { name: 'Add workstation' }).click();
    await ws.getByText('Must be within the room length (8 m), got 30').waitFor();
    await ws.getByLabel('Nose/mouth x').fill('2.5');
    await ws.getByRole('button', { name: 'Add workstation' }).click();
    await page.getByText('Workstation “Wet saw” added.').waitFor();
    await page.getByRole('link', { name: 'Wet saw' }).waitFor();
    await shot(page, 'workspace-places');
    await page.close();
  });
});
