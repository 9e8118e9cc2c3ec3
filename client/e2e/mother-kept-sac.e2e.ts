import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { BASE_URL, openBrowser, signIn, type Browser } from './support/browser';
import { daysAgo } from './support/api';

/** Waits for a page to settle (the server answers in its own time); it does not measure anything. */
const eventually = <T>(read: () => Promise<T> | T) => expect.poll(read, { timeout: 15_000, interval: 100 });

/** The demo project whose female keeps her sacs (server/src/seed/mother-kept-brood.seeder.ts): shares Mira 2, Tomasz 1. */
const PROJECT = 'Pulchripes brood kept by the mother';

async function fill(page: Page, label: string, value: string) {
  // Starts with the label: a required field's label ends with an asterisk.
  const input = page.getByLabel(new RegExp(`^${label.replace(/[()]/g, '\\$&')}`)).first();
  await input.click();
  await input.fill(value);
  await input.press('Tab');
}

let keeper: Browser;

beforeAll(async () => {
  keeper = await openBrowser();
  await signIn(keeper.page, 'keeper@broodsilk.test');
});
afterAll(async () => {
  await keeper?.close();
});

describe('a sac left with the mother', () => {
  it('is recorded as staying with her, shows no pull warning, is counted at emergence, and its shares follow from the count', async () => {
    const page = keeper.page;
    // Opened by its address, read from the list: a click while the list is still being re-rendered
    // by its second query (the dashboard's next-due column) could land on a replaced row.
    await page.goto(`${BASE_URL}/projects`);
    const href = await page.getByRole('link', { name: PROJECT }).first().getAttribute('href');
    await page.goto(`${BASE_URL}${href}`);
    await eventually(() => page.getByTestId('section-sacs').isVisible()).toBe(true);
    const projectUrl = page.url();

    // Laid 66 days ago: well past the species' pull window (day 30–45), yet the keeper chose to leave it.
    const sacs = page.getByTestId('section-sacs');
    await sacs.getByRole('button', { name: 'Record a sac' }).click();
    await fill(page, 'Lay date', daysAgo(66));
    await sacs.getByText('Stays with the mother').click();
    await sacs.getByRole('button', { name: 'Save sac' }).click();
    const card = page.getByTestId('sac-card').filter({ hasText: 'Day 66' });
    await eventually(() => card.count()).toBe(1);
    expect(await card.getByTestId('pull-window-badge').count()).toBe(0);
    await card.getByRole('link').first().click();

    await eventually(() => page.getByTestId('pull-window-state').textContent()).toBe('Left with the mother');
    expect(await page.getByText('Pull window past').count()).toBe(0);
    const sacId = page.url().split('/').pop()!;

    // The young have left the sac: the keeper counts them where they are.
    await page.getByRole('button', { name: 'The young have emerged' }).click();
    await eventually(() => page.getByText('Young emerged').first().isVisible()).toBe(true);
    await fill(page, '1st instar', '600');
    await fill(page, 'Dark (non-viable)', '3');
    await page.getByRole('button', { name: 'Save opening' }).click();
    const confirm = page.getByRole('dialog', { name: 'Record the opening' });
    await confirm.getByRole('button', { name: 'Record the opening' }).click();
    await eventually(() => page.getByTestId('opening').textContent()).toContain('600 viable of 603');

    await page.goto(`${projectUrl}/account`);
    const shares = page.getByTestId(`shares-sac-${sacId}`);
    await eventually(() => shares.textContent()).toContain('600 young counted');
    // Weights 2 : 1 of 600 young (the demo terms): 400 and 200, exact thirds.
    const row = (name: string) => shares.getByRole('row').filter({ hasText: name }).getByRole('cell').nth(1).textContent();
    await eventually(() => row('Mira Okonkwo')).toBe('400');
    await eventually(() => row('Tomasz Wierzba')).toBe('200');
  });
});
