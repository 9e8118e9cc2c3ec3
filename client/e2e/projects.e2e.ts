import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { BASE_URL, DEMO_PASSWORD, openBrowser, screenshot, signIn, type Browser } from './support/browser';
import { invitationLink } from './support/mail';
import { daysAgo } from './support/api';

/** Waits for a page to settle (the server answers in its own time); it does not measure anything. */
const eventually = <T>(read: () => Promise<T> | T) => expect.poll(read, { timeout: 15_000, interval: 100 });

const TITLE = `Regalis loan ${Date.now().toString(36)}`;

async function pick(page: Page, label: string, search: string) {
  const input = page.getByLabel(new RegExp(`^${label}`)).first();
  await input.click();
  await input.fill(search);
  await page
    .getByRole('option', { name: new RegExp(search) })
    .first()
    .click();
}

async function typeDate(page: Page, label: string, date: string) {
  const input = page.getByLabel(new RegExp(`^${label}`)).first();
  await input.click();
  await input.fill(date);
  await input.press('Tab');
}

let keeper: Browser;
let projectUrl = '';
let sacId = '';

beforeAll(async () => {
  keeper = await openBrowser();
  await signIn(keeper.page, 'keeper@broodsilk.test');
});
afterAll(async () => {
  await keeper?.close();
});

describe('a breeding project from loaned male to the first roll', () => {
  it('the keeper creates a project with the male on loan from Tomasz, inviting him as a partner', async () => {
    const page = keeper.page;
    await page.goto(`${BASE_URL}/projects/new`);
    await page.getByLabel(/^Title/).fill(TITLE);
    await pick(page, 'Female', 'MO-007');
    await pick(page, 'Male', 'MO-030');
    await eventually(() => page.getByText(/is on a breeding loan to you/).count()).toBe(1);
    await page.getByRole('button', { name: 'Add a party' }).click();
    const party = page.getByTestId('party-0');
    await party.getByLabel(/^Name/).fill('Tomasz Wierzba');
    await party.getByLabel(/^E-mail/).fill('partner@broodsilk.test');
    await page.getByRole('button', { name: 'Create project' }).click();
    await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
    projectUrl = page.url();
    await eventually(() => page.getByRole('heading', { name: TITLE }).count()).toBe(1);
    await eventually(() => page.getByTestId('stage-current').textContent()).toContain('Planned');
    await eventually(() => page.getByTestId('parties-table').textContent()).toContain('Tomasz Wierzba');
    await eventually(() => page.getByTestId('terms-version-1').textContent()).toContain('Proposed');
  });

  it('records a connected pairing and a sac laid 22 days ago, which shows day 22 and an open pull window', async () => {
    const page = keeper.page;
    const pairings = page.getByTestId('section-pairings');
    await pairings.getByRole('button', { name: 'Record a pairing' }).click();
    // 48 days before the sac: above the 45-day minimum of Old World arboreals (species-groups data).
    await typeDate(page, 'Day the male went in', daysAgo(70));
    await pairings.getByRole('button', { name: 'Save pairing' }).click();
    await eventually(() => page.getByTestId('pairings-table').textContent()).toContain('Connected');

    const sacs = page.getByTestId('section-sacs');
    await sacs.getByRole('button', { name: 'Record a sac' }).click();
    await typeDate(page, 'Lay date', daysAgo(22));
    await sacs.getByRole('button', { name: 'Save sac' }).click();
    await eventually(() => page.getByTestId('sac-day').first().textContent()).toBe('Day 22');
    await eventually(() => page.getByTestId('pull-window-badge').first().textContent()).toBe('Pull window open');
    await eventually(() => page.getByTestId('stage-current').textContent()).toContain('Sac laid');
    const href = await page.getByTestId('sac-card').first().getByRole('link').first().getAttribute('href');
    sacId = href!.split('/').pop()!;
    expect(sacId).toMatch(/^[0-9a-f-]{36}$/);
    expect(existsSync(await screenshot(page, 'project-page'))).toBe(true);
  });

  it('shows the open pull window on the dashboard', async () => {
    const page = keeper.page;
    await page.goto(`${BASE_URL}/`);
    const upcoming = page.getByTestId('card-upcoming');
    await eventually(() => upcoming.textContent()).toContain(TITLE);
    const row = upcoming.getByRole('row').filter({ hasText: TITLE });
    await eventually(() => row.getByTestId('upcoming-state').textContent()).toBe('Open now');
    expect(existsSync(await screenshot(page, 'dashboard'))).toBe(true);
  });

  it('pulls the sac and logs a roll on the phone-sized incubator screen', async () => {
    const phone = await openBrowser({ phone: true });
    try {
      await signIn(phone.page, 'keeper@broodsilk.test');
      await phone.page.goto(`${BASE_URL}/incubator/${sacId}`);
      await phone.page.getByRole('button', { name: 'Pulled, into the incubator' }).click();
      // Asked once, with the time of the pull (now unless changed); day 22 is inside the default window, so no warning.
      const pull = phone.page.getByRole('dialog', { name: 'Record the pull' });
      expect(await pull.getByTestId('confirm-warning').count()).toBe(0);
      await pull.getByRole('button', { name: 'Record the pull' }).click();
      await eventually(() => phone.page.getByTestId('entry-done').textContent()).toContain('Pulled');
      await eventually(() => phone.page.getByTestId('next-roll').textContent()).toMatch(/Roll due now|Roll overdue/);
      await eventually(() => phone.page.getByTestId('heat-caution').textContent()).toContain('thermostat');
      await phone.page.getByRole('button', { name: 'Rolled now' }).click();
      await eventually(() => phone.page.getByTestId('entry-done').textContent()).toMatch(/^Roll logged at /);
      await eventually(() => phone.page.getByTestId('next-roll').textContent()).toMatch(/Next roll.*last roll/);
      expect(existsSync(await screenshot(phone.page, 'incubator-phone'))).toBe(true);
      await phone.page.goto(`${BASE_URL}/sacs/${sacId}`);
      await eventually(() => phone.page.getByTestId('care-log').textContent()).toContain('Rolled');
      expect(existsSync(await screenshot(phone.page, 'sac-phone'))).toBe(true);
      await phone.page.goto(projectUrl);
      await eventually(() => phone.page.getByTestId('stage-current').textContent()).toContain('In incubator');
      expect(existsSync(await screenshot(phone.page, 'project-phone'))).toBe(true);
      await phone.page.goto(`${BASE_URL}/`);
      await eventually(() => phone.page.getByTestId('card-rolls').textContent()).toContain('Rolls');
      expect(existsSync(await screenshot(phone.page, 'dashboard-phone'))).toBe(true);
    } finally {
      await phone.close();
    }
  });

  it('Tomasz joins through his invitation, sees the project and accepts the terms', async () => {
    const link = await invitationLink('partner@broodsilk.test', TITLE);
    const partner = await openBrowser();
    try {
      await partner.page.goto(link);
      await eventually(() => partner.page.getByTestId('invitation').textContent()).toContain(TITLE);
      await partner.page.getByRole('link', { name: 'Sign in to join' }).click();
      await partner.page.waitForURL(/\/sign-in\?next=/);
      // The sign-in page sends him back to the invitation (a page without the signed-in shell).
      await partner.page.getByLabel(/^E-mail/).fill('partner@broodsilk.test');
      await partner.page.getByLabel(/^Password/).fill(DEMO_PASSWORD);
      await partner.page.getByRole('button', { name: 'Sign in' }).click();
      await partner.page.waitForURL(/\/invitations\//);
      await eventually(() => partner.page.getByTestId('invitation').textContent()).toContain('Signed in as Tomasz Wierzba');
      expect(existsSync(await screenshot(partner.page, 'invitation'))).toBe(true);
      await partner.page.getByRole('button', { name: 'Join the project' }).click();
      await partner.page.waitForURL(projectUrl);
      await eventually(() => partner.page.getByRole('heading', { name: TITLE }).count()).toBe(1);
      await eventually(() => partner.page.getByTestId('stage-current').textContent()).toContain('In incubator');
      await partner.page.getByRole('button', { name: 'Accept these terms' }).click();
      await partner.page
        .getByRole('dialog', { name: 'Accept these terms' })
        .getByRole('button', { name: /^Yes, accept version/ })
        .click();
      await eventually(() => partner.page.getByTestId('terms-version-1').textContent()).toContain('In force');
      await partner.page.goto(`${BASE_URL}/projects`);
      await eventually(() => partner.page.getByTestId('project-table').textContent()).toContain(TITLE);
      expect(existsSync(await screenshot(partner.page, 'partner-projects'))).toBe(true);
    } finally {
      await partner.close();
    }
  });
});
