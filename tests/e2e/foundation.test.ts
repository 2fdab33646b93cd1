import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '../../server/db/seed';
import { shot, signIn } from '../helpers/browser';
import { useServerAndBrowser } from '../helpers/e2e-setup';

const env = useServerAndBrowser();

const EXPECTED_NAV: Record<string, { home: RegExp; heading: string; nav: string[] }> = {
  admin: {
    home: /\/people$/,
    heading: 'People',
    nav: [
      'Scenarios',
      'Side by side',
      'Workstations',
      'Dust agents',
      'Size profiles',
      'Particle calculator',
      'Hood calculator',
      'Your station',
      'Audit trail',
      'People',
      'Outbox',
    ],
  },
  engineer: {
    home: /\/scenarios$/,
    heading: 'Scenarios',
    nav: [
      'Scenarios',
      'Side by side',
      'Workstations',
      'Dust agents',
      'Size profiles',
      'Particle calculator',
      'Hood calculator',
      'Audit trail',
    ],
  },
  viewer: {
    home: /\/scenarios$/,
    heading: 'Scenarios',
    nav: [
      'Scenarios',
      'Side by side',
      'Workstations',
      'Dust agents',
      'Size profiles',
      'Particle calculator',
      'Hood calculator',
      'Audit trail',
    ],
  },
  operator: { home: /\/station$/, heading: 'Edge-grinding bench 2', nav: ['Your station'] },
};

async function navLabels(page: Page) {
  return page.getByRole('navigation', { name: 'Main' }).getByRole('link').allTextContents();
}

describe('signing in as each demo role', () => {
  it('prints the URL and every demo sign-in at start-up', () => {
    for (const p of DEMO_PEOPLE) expect(env.server.output()).toContain(p.email);
  });

  for (const person of DEMO_PEOPLE) {
    it(`lands the ${person.role} on their own home with their own navigation`, async () => {
      const page = await env.browser.newPage();
      await signIn(page, env.server.url, person.email, person.password);
      const expected = EXPECTED_NAV[person.role];
      await page.waitForURL(expected.home);
      await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe(expected.heading);
      expect(await navLabels(page)).toEqual(expected.nav);
      const font = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
      expect(font).toMatch(/Manrope/);
      await shot(page, `foundation-home-${person.role}`);
      await page.close();
    });
  }

  it('shows one message for a wrong password and stays on the sign-in page', async () => {
    const page = await env.browser.newPage();
    await signIn(page, env.server.url, 'viewer@motewalk.local', 'wrong-password-here');
    await expect.poll(() => page.getByRole('alert').textContent()).toMatch(/e-mail or password is not right/);
    await shot(page, 'foundation-sign-in-refused');
    await page.close();
  });
});

describe('inviting a colleague', () => {
  it('invites a person, opens the link from the outbox, sets a password and signs in as them', async () => {
    const admin = DEMO_PEOPLE.find((p) => p.role === 'admin')!;
    const page = await env.browser.newPage();
    await signIn(page, env.server.url, admin.email, admin.password);
    await page.waitForURL(/\/people$/);
    const form = page.getByRole('form', { name: 'Invite a person' });
    await form.getByLabel('Name').fill('Noor Castellan');
    await form.getByLabel('E-mail').fill('noor.castellan@motewalk.local');
    await form.getByLabel('Role').selectOption('viewer');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await expect
      .poll(() => page.getByRole('status').allTextContents())
      .toContainEqual(expect.stringMatching(/Invitation sent to noor.castellan@motewalk.local/));
    await expect.poll(() => page.getByRole('cell', { name: 'noor.castellan@motewalk.local' }).count()).toBe(1);
    await shot(page, 'foundation-people');

    await page.getByRole('link', { name: 'Outbox' }).click();
    const link = page.getByRole('link', { name: /set-password\?token=/ }).first();
    await link.waitFor();
    await shot(page, 'foundation-outbox');
    const href = await link.getAttribute('href');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/sign-in/);

    await page.goto(href!);
    await page.getByLabel('New password').fill('noor-long-password');
    await page.getByLabel('Repeat the password').fill('noor-long-password');
    await page.getByRole('button', { name: 'Set password' }).click();
    await page.getByText('Password set for noor.castellan@motewalk.local').waitFor();
    await shot(page, 'foundation-password-set');
    await page.getByRole('link', { name: 'Sign in now' }).click();
    await signIn(page, env.server.url, 'noor.castellan@motewalk.local', 'noor-long-password');
    await page.waitForURL(/\/scenarios$/);
    expect(await navLabels(page)).toEqual(EXPECTED_NAV.viewer.nav);
    await page.close();
  });
});
