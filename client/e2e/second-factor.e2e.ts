/**
 * A keeper sets up a TOTP second factor in Settings and signs in with a code. Codes come from the
 * reference library `otpauth` (RFC 6238: SHA-1, 6 digits, 30-second steps), as a phone app would make them.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Secret, TOTP } from 'otpauth';
import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { BASE_URL, openBrowser, type Browser } from './support/browser';

const codeAt = (secret: string, ms: number) =>
  new TOTP({ secret: Secret.fromBase32(secret), algorithm: 'SHA1', digits: 6, period: 30 }).generate({ timestamp: ms });

/** WCAG 2.2 AA as axe-core tags it (axe-core docs, "Axe-core Tags"), for the states accessibility.e2e.ts does not reach. */
const WCAG_AA = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'];
const violations = async (page: Page) => (await new AxeBuilder({ page }).withTags(WCAG_AA).analyze()).violations.map((v) => `${v.id}: ${v.help}`);

/** The link of the confirmation e-mail to `email`, read from the mail sink's REST API (maildev, `GET /api/email`). */
async function confirmationLink(email: string): Promise<string> {
  const sink = process.env.MAILDEV_API ?? 'http://127.0.0.1:1080';
  for (let attempt = 0; attempt < 100; attempt += 1) {
    const mails = (await (await fetch(`${sink}/api/email`)).json()) as { to: { address: string }[]; text?: string }[];
    const text = mails.find((m) => m.to.some((to) => to.address === email) && /confirm-email\?token=/.test(m.text ?? ''))?.text;
    const token = text && /confirm-email\?token=([A-Za-z0-9_-]{43})/.exec(text)?.[1];
    if (token) return `${BASE_URL}/confirm-email?token=${token}`;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no confirmation mail to ${email}`);
}

let b: Browser;
beforeAll(async () => {
  b = await openBrowser();
});
afterAll(async () => {
  await b?.close();
});

describe('second factor', () => {
  it('set up in Settings with the QR key, then signing in asks for the code', async () => {
    const { page, context } = b;
    const email = `totp.${Date.now()}@example.test`;
    const password = 'two steps are safer';
    // A fresh account through the register page; the confirmation link from the mail sink signs this browser in.
    await page.goto(`${BASE_URL}/register`);
    await page.getByLabel(/^Your name/).fill('Code Keeper');
    await page.getByLabel(/^E-mail/).fill(email);
    await page.getByLabel(/^Password/).fill(password);
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByText('Check your e-mail').waitFor();
    await page.goto(await confirmationLink(email));
    await page.getByRole('button', { name: 'Confirm my address' }).click();
    await page.getByTestId('shell-user').waitFor();

    await page.goto(`${BASE_URL}/settings`);
    await page.getByRole('button', { name: 'Set up an authenticator app' }).click();
    await expect.poll(() => page.getByRole('img', { name: /QR code/ }).isVisible()).toBe(true);
    expect(await violations(page)).toEqual([]);
    const secret = (await page.getByTestId('totp-secret').textContent())!.trim();
    await page.getByLabel(/^Code from the app/).fill(codeAt(secret, Date.now()));
    await page.getByLabel(/^Your password/).fill(password);
    await page.getByRole('button', { name: 'Turn on' }).click();
    await page.getByTestId('recovery-codes').waitFor();
    expect(await page.getByTestId('recovery-codes').locator('li').count()).toBe(10);
    expect(await violations(page)).toEqual([]);
    await page.getByRole('button', { name: 'I have saved them' }).click();
    await page.getByText(/Recovery codes left: 10 of 10/).waitFor();

    await context.clearCookies();
    await page.goto(`${BASE_URL}/sign-in`);
    await page.getByLabel(/^E-mail/).fill(email);
    await page.getByLabel(/^Password/).fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    // The code used for the set-up cannot be used again, so the next step's code (one step of drift is allowed).
    await page.getByLabel(/^Code/).waitFor();
    expect(await violations(page)).toEqual([]);
    await page.getByLabel(/^Code/).fill(codeAt(secret, Date.now() + 30_000));
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByTestId('shell-user').waitFor();
  });
});
