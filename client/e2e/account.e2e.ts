import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { BASE_URL, openBrowser, screenshot, signIn, type Browser } from './support/browser';

// The demo project with a counted brood: Mira runs it, Tomasz is a partner, terms in force (from the demo seed).
const PROJECT_TITLE = 'Versicolor shared brood';

/** Waits (up to a limit, not a measurement) for what the page shows after a refetch. */
const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 20_000, interval: 250 });

let keeper: Browser;
let partner: Browser;
let projectId = '';

/**
 * The demo seed has the project and its terms; when no sac of it has young in care for Tomasz's
 * hand-over, one is recorded here through the same API the sac pages use (a counted brood of 30).
 */
async function ensureCountedBrood(page: Page): Promise<string> {
  return page.evaluate(async (title) => {
    const json = async (res: Response) => {
      if (!res.ok) throw new Error(`${res.status} ${await res.text()}`);
      return res.json();
    };
    const { csrfToken } = await json(await fetch('/api/auth/csrf'));
    const post = (path: string, body: unknown) =>
      fetch(`/api${path}`, { method: 'POST', headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken }, body: JSON.stringify(body) }).then(
        json,
      );
    const list = await json(await fetch('/api/projects'));
    const project = (list.items ?? list).find((p: { title: string }) => p.title === title);
    if (!project) throw new Error(`No demo project "${title}"`);
    const shares = await json(await fetch(`/api/projects/${project.id}/shares`));
    const balances = await json(await fetch(`/api/projects/${project.id}/balances`));
    const tomasz = balances.parties.find((p: { name: string }) => p.name.startsWith('Tomasz'));
    const inCare = shares.sacs.reduce((n: number, s: { aliveInCare: number }) => n + s.aliveInCare, 0);
    if (inCare < 3 || !tomasz || tomasz.owedSpiderlings < 3) {
      const day = (n: number) => new Date(Date.now() - n * 86_400_000).toISOString();
      const sac = await post(`/projects/${project.id}/sacs`, {
        layDate: day(60).slice(0, 10),
        pulledAt: day(36),
        // The demo pairing is not what this spec is about.
        acknowledgedWarnings: ['sac-without-pairing', 'sac-soon-after-pairing', 'sac-long-after-pairing'],
        warningReason: 'Recorded for the hand-over check.',
      });
      await post(`/sacs/${sac.id}/opening`, {
        openedAt: day(20),
        healthyEggs: 0,
        eggsWithLegs: 0,
        nymphs: 32,
        darkEggs: 2,
        spoiledEggs: 0,
        keptBack: 0,
        acknowledgedWarnings: ['eggs-outside-species-range'],
        warningReason: 'Recorded for the hand-over check.',
      });
      await post(`/sacs/${sac.id}/counts`, { stage: 'second-instar', alive: 30, lost: 2, lossReason: 'other' });
    }
    return project.id as string;
  }, PROJECT_TITLE);
}

const balanceRows = (page: Page) =>
  page
    .getByRole('table', { name: 'Balances' })
    .getByRole('row')
    .evaluateAll((rows) => rows.map((r) => Array.from(r.querySelectorAll('td,th')).map((c) => c.textContent?.trim())));

const owedTo = (page: Page, name: RegExp) =>
  page.getByRole('table', { name: 'Balances' }).getByRole('row').filter({ hasText: name }).locator('td').nth(1).textContent();

beforeAll(async () => {
  keeper = await openBrowser();
  partner = await openBrowser();
});
afterAll(async () => {
  await keeper?.close();
  await partner?.close();
});

describe('account', () => {
  it('the keeper records a hand-over to the partner, the partner confirms it, and both see the same balance', async () => {
    const page = keeper.page;
    await page.goto(`${BASE_URL}/sign-in`);
    await signIn(page, 'keeper@broodsilk.test');
    projectId = await ensureCountedBrood(page);

    // Through the project page's link to its Account.
    await page.goto(`${BASE_URL}/projects/${projectId}`);
    await page.getByRole('link', { name: 'Account', exact: true }).click();
    await page.waitForURL(new RegExp(`/projects/${projectId}/account$`));
    await page.getByRole('table', { name: 'Balances' }).waitFor();
    const owedBefore = Number(await owedTo(page, /^Tomasz/));
    expect(owedBefore).toBeGreaterThanOrEqual(3);

    await page.getByRole('button', { name: 'Record a hand-over' }).click();
    const form = page.getByRole('form', { name: 'Record a hand-over' });
    const to = form.getByLabel(/^To/);
    const tomaszOption = await to.locator('option', { hasText: 'Tomasz' }).getAttribute('value');
    await to.selectOption(tomaszOption!);
    const sac = form.getByLabel(/^From the sac/);
    if (await sac.count()) await sac.selectOption({ index: (await sac.locator('option').count()) - 1 });
    await form.getByLabel(/^Count/).fill('3');
    await form.getByText('Shipment', { exact: true }).click();
    const cautions = form.getByTestId('shipping-cautions');
    await poll(() => cautions.textContent()).toContain('overnight');
    expect(await cautions.textContent()).toMatch(/32 °C/);
    expect(await cautions.textContent()).toMatch(/CITES/);
    expect(await cautions.textContent()).toMatch(/local law and the carrier’s rules/i);
    await form.getByLabel(/^Carrier/).fill('Overnight courier');
    await form.getByLabel(/^Tracking/).fill(`TRK-${Date.now()}`);
    await screenshot(page, 'account-hand-over-form');
    await form.getByRole('button', { name: 'Record hand-over' }).click();
    await form.waitFor({ state: 'detached' });

    const handOverRow = page.getByRole('table', { name: 'Account entries' }).getByRole('row').filter({ hasText: 'Overnight courier' }).last();
    await poll(() => handOverRow.textContent()).toContain('Waiting for Tomasz');
    await poll(async () => Number(await owedTo(page, /^Tomasz/))).toBe(owedBefore - 3);

    // The partner confirms receipt with the arrival counts.
    const p = partner.page;
    await p.goto(`${BASE_URL}/projects/${projectId}/account`);
    await p.waitForURL(/\/sign-in/);
    await signIn(p, 'partner@broodsilk.test');
    await p.waitForURL(new RegExp(`/projects/${projectId}/account$`));
    await p.getByRole('table', { name: 'Balances' }).waitFor();
    expect(await p.getByRole('button', { name: 'Record a hand-over' }).count()).toBe(0);
    const confirmForm = p.getByRole('form', { name: /^Confirm receipt of hand-over/ }).last();
    await confirmForm.getByLabel('Arrived alive').fill('3');
    await confirmForm.getByLabel('Arrived dead').fill('0');
    await confirmForm.getByRole('button', { name: 'Confirm receipt' }).click();
    // Asked once before it counts.
    await p.getByRole('dialog', { name: 'Confirm receipt' }).getByRole('button', { name: 'Yes, confirm receipt' }).click();
    const partnerRow = p.getByRole('table', { name: 'Account entries' }).getByRole('row').filter({ hasText: 'Overnight courier' }).last();
    await poll(() => partnerRow.textContent()).not.toContain('Waiting for');
    expect(await partnerRow.textContent()).toContain('Counts');
    await poll(() => p.getByRole('table', { name: 'Account entries' }).getByRole('row').filter({ hasText: 'Arrival count' }).last().textContent()).toContain(
      '3 alive, 0 dead',
    );

    // Both see the same balance.
    await page.reload();
    await page.getByRole('table', { name: 'Balances' }).waitFor();
    await poll(() =>
      page.getByRole('table', { name: 'Account entries' }).getByRole('row').filter({ hasText: 'Overnight courier' }).last().textContent(),
    ).not.toContain('Waiting for');
    const keeperView = await balanceRows(page);
    const partnerView = await balanceRows(p);
    expect(partnerView).toEqual(keeperView);
    expect(Number(await owedTo(p, /^Tomasz/))).toBe(owedBefore - 3);
    await screenshot(page, 'account-keeper');
    await screenshot(p, 'account-partner');
  });

  it('the partner pays what they owe on the payment pages and the payment shows in the account', async () => {
    const page = keeper.page;
    const p = partner.page;

    // Mira links a payout account so she can be paid (once per database).
    await page.goto(`${BASE_URL}/settings/payouts`);
    await page.getByTestId('payout-setup').waitFor();
    if (!(await page.getByText('Ready to receive payments').count())) {
      await page.getByRole('button', { name: /Set up payouts|Finish setting up payouts/ }).click();
      await page.getByRole('button', { name: 'Complete test onboarding' }).click();
      await page.waitForURL(/\/settings\/payouts\?done=1/);
      await poll(async () => {
        await page.reload();
        await page.getByTestId('payout-setup').waitFor();
        return page.getByText('Ready to receive payments').count();
      }).toBe(1);
    }
    await screenshot(page, 'account-payouts');

    // Mira paid €12.00 for Tomasz (the shipping box); he confirms it, so he owes her that.
    await page.goto(`${BASE_URL}/projects/${projectId}/account`);
    await page.getByRole('button', { name: 'Record a payment' }).click();
    const money = page.getByRole('form', { name: 'Record a payment' });
    const from = money.getByLabel('Paid by');
    await from.selectOption((await from.locator('option', { hasText: 'Mira' }).getAttribute('value'))!);
    const payee = money.getByLabel('Paid to');
    await payee.selectOption((await payee.locator('option', { hasText: 'Tomasz' }).getAttribute('value'))!);
    await money.getByLabel(/^Amount/).fill('12');
    await money.getByLabel('Note').fill('Shipping box paid for Tomasz');
    await money.getByRole('button', { name: 'Record payment' }).click();
    await money.waitFor({ state: 'detached' });

    await p.reload();
    await p.getByRole('button', { name: 'Confirm the payment arrived' }).last().click();
    await p.getByRole('dialog', { name: 'Confirm the payment' }).getByRole('button', { name: 'Yes, it arrived' }).click();
    const debt = p.getByTestId('account-debts');
    await poll(() => debt.textContent()).toMatch(/Tomasz \S+ owes Mira \S+ €\d+\.\d\d/);
    const owedText = (await debt.textContent())!.match(/€(\d+\.\d\d)/)![1]!;

    // "Pay what you owe" → the provider's page → "Pay (test)" → back to the account.
    const payForm = p.getByRole('form', { name: /^Pay Mira/ });
    expect(await payForm.getByLabel(/^Amount/).inputValue()).toBe(String(Number(owedText)));
    await payForm.getByLabel(/^Amount/).fill('12');
    await payForm.getByRole('button', { name: 'Pay what you owe' }).click();
    await p.getByRole('button', { name: 'Pay (test)' }).click();
    await p.waitForURL(new RegExp(`/projects/${projectId}/account\\?paid=`));
    await p.getByText('The payment provider took your payment.').waitFor();

    const providerRow = p.getByRole('table', { name: 'Account entries' }).getByRole('row').filter({ hasText: 'Payment provider' }).last();
    await poll(async () => {
      await p.reload();
      await p.getByRole('table', { name: 'Account entries' }).waitFor();
      return providerRow.count();
    }).toBeGreaterThan(0);
    expect(await providerRow.textContent()).toContain('€12.00');
    expect(await providerRow.textContent()).toContain('Tomasz');
    await screenshot(p, 'account-partner-paid');

    // The keeper sees the same payment.
    await page.reload();
    await poll(() => page.getByRole('table', { name: 'Account entries' }).getByRole('row').filter({ hasText: 'Payment provider' }).count()).toBeGreaterThan(0);

    // Tomasz's statement: the CSV link downloads with Mira's session; the e-mail goes to him.
    const statement = page.getByTestId('statement-actions');
    const picker = statement.getByLabel('Statement for');
    await picker.selectOption((await picker.locator('option', { hasText: 'Tomasz' }).getAttribute('value'))!);
    const csvHref = await statement.getByRole('link', { name: 'Download CSV' }).getAttribute('href');
    const csv = await page.request.get(`${BASE_URL}${csvHref}`);
    expect(csv.status()).toBe(200);
    expect(csv.headers()['content-type']).toContain('text/csv');
    expect(await csv.text()).toContain('Tomasz');
    const pdf = await page.request.get(`${BASE_URL}${await statement.getByRole('link', { name: 'Download PDF' }).getAttribute('href')}`);
    expect(pdf.headers()['content-type']).toContain('application/pdf');
    await statement.getByRole('button', { name: /^E-mail it to Tomasz/ }).click();
    await statement.getByRole('status').filter({ hasText: 'The statement was e-mailed to Tomasz' }).waitFor();
  });

  it('works on a phone: the account stacks and its tables scroll inside the page', async () => {
    const phone = await openBrowser({ phone: true });
    try {
      await phone.page.goto(`${BASE_URL}/sign-in`);
      await signIn(phone.page, 'partner@broodsilk.test');
      await phone.page.goto(`${BASE_URL}/projects/${projectId}/account`);
      const cards = phone.page.getByRole('list', { name: 'Account entries, newest last' });
      await cards.waitFor();
      expect(await phone.page.getByRole('table', { name: 'Account entries' }).isVisible()).toBe(false);
      await poll(() => cards.getByRole('listitem').filter({ hasText: 'Payment provider' }).count()).toBeGreaterThan(0);
      const widths = await phone.page.evaluate(() => ({ doc: document.documentElement.scrollWidth, view: window.innerWidth }));
      expect(widths.doc).toBeLessThanOrEqual(widths.view + 1);
      await screenshot(phone.page, 'account-phone');
    } finally {
      await phone.close();
    }
  });
});
