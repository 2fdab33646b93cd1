import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '../../server/db/seed';
import { shot, signIn } from '../helpers/browser';
import { useServerAndBrowser } from '../helpers/e2e-setup';

const env = useServerAndBrowser();
const engineer = DEMO_PEOPLE.find((p) => p.role === 'engineer')!;
const PHONE = { width: 390, height: 844 };

async function phoneEngineer(): Promise<Page> {
  const page = await env.browser.newPage();
  await page.setViewportSize(PHONE);
  await signIn(page, env.server.url, engineer.email, engineer.password);
  await page.waitForURL(/\/scenarios$/);
  return page;
}

async function openScenario(page: Page, workstation: string, name: string) {
  await page.goto(`${env.server.url}/places`);
  await page.getByRole('link', { name: workstation }).click();
  await page.getByRole('table', { name: 'Scenarios' }).getByRole('link', { name, exact: true }).click();
  await page.waitForURL(/\/scenarios\/\d+$/);
}

const savedRunRows = (page: Page) => page.getByRole('table', { name: 'Saved runs' }).locator('tbody tr');
const approveForm = (page: Page) => page.getByRole('form', { name: "Approve as the station's current control" });

describe('the scenario page after saving and approving, on a 390 px phone', () => {
  it('lists a saved run and offers it for approval at once, and stops saying draft once approved, without a reload', async () => {
    const page = await phoneEngineer();
    await openScenario(page, 'Sack tipping at mixer 1', 'Flanged hood');
    const status = page.getByTestId('scenario-status');
    expect(await status.textContent()).toBe('draft');
    await savedRunRows(page).first().waitFor();
    const before = await savedRunRows(page).count();

    // A changed seed makes the stored run out of date, so approval has to wait for a new one.
    await page.getByLabel('Seed').fill('7');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText(/Saved as version 2/).waitFor();
    await page.getByText('The latest saved run is out of date').waitFor();

    await page.getByRole('button', { name: /^▶ Run/ }).click();
    // Focus follows the run: to its progress, then to what it produced.
    const focused = () => page.evaluate(() => document.activeElement?.getAttribute('aria-label') ?? null);
    await expect.poll(focused).toBe('Run progress');
    await page.getByRole('button', { name: 'Save this run' }).waitFor({ timeout: 120_000 });
    await expect.poll(focused).toBe('Results of this run');
    await page.getByRole('button', { name: 'Save this run' }).click();
    await page.getByText('✓ Run saved').waitFor();
    await expect.poll(() => savedRunRows(page).count()).toBe(before + 1);
    expect(await page.getByText('The latest saved run is out of date').count()).toBe(0);
    await approveForm(page).waitFor();
    await shot(page, 'editor-state-run-saved-390');

    await approveForm(page).getByLabel('Note (what was checked)').fill('Seed 7 run checked');
    await approveForm(page)
      .getByRole('button', { name: /Approve/ })
      .click();
    await page.getByText(/Approved\. The station board now shows this control/).waitFor();
    await expect.poll(() => status.textContent()).toBe('★ approved as the current control');
    expect(await page.getByText(/Currently approved at this station: “Flanged hood”/).count()).toBe(1);
    await shot(page, 'editor-state-approved-390');
    await page.close();
  });
});

describe('unsaved edits in the scenario editor, on a 390 px phone', () => {
  it('asks before leaving the page with edits, keeps them on Stay, and leaves on Leave without saving', async () => {
    const page = await phoneEngineer();
    await openScenario(page, 'Sanding bench', 'Side hood');
    const name = page.getByLabel('Scenario name');
    await name.fill('Side hood, moved closer');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Workstations' }).click();
    const dialog = page.getByRole('alertdialog', { name: 'Leave without saving?' });
    await dialog.waitFor();
    await shot(page, 'editor-state-leave-prompt-390');
    const width = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(await dialog.evaluate((d) => d.getBoundingClientRect().right)).toBeLessThanOrEqual(width);

    await dialog.getByRole('button', { name: 'Stay and keep editing' }).click();
    await dialog.waitFor({ state: 'detached' });
    expect(page.url()).toMatch(/\/scenarios\/\d+$/);
    expect(await name.inputValue()).toBe('Side hood, moved closer');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Workstations' }).click();
    await dialog.getByRole('button', { name: 'Leave without saving' }).click();
    await page.getByRole('heading', { name: 'Sites and workstations' }).waitFor();
    await page.close();
  });

  it('lets the browser warn when the tab is closed with edits, and not once they are saved', async () => {
    const page = await phoneEngineer();
    await openScenario(page, 'Sanding bench', 'Downdraft bench');
    await page.getByLabel('Scenario name').fill('Downdraft bench, faster fan');
    const dialog = page.waitForEvent('dialog');
    await page.close({ runBeforeUnload: true });
    const prompt = await dialog;
    expect(prompt.type()).toBe('beforeunload');
    await prompt.dismiss();
    expect(page.isClosed()).toBe(false);

    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText(/Saved as version 2/).waitFor();
    let asked = false;
    page.on('dialog', (d) => {
      asked = true;
      void d.accept();
    });
    await page.close({ runBeforeUnload: true });
    await expect.poll(() => page.isClosed()).toBe(true);
    expect(asked).toBe(false);
  });
});
