import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync } from 'node:fs';
import { BASE_URL, openBrowser, screenshot, signIn, type Browser } from './support/browser';

let b: Browser;
beforeAll(async () => {
  b = await openBrowser();
});
afterAll(async () => {
  await b.close();
});

describe('signing in', () => {
  it('sends an anonymous visitor to sign-in, then shows the demo keeper in the shell', async () => {
    await b.page.goto(`${BASE_URL}/settings`);
    await b.page.waitForURL(/\/sign-in\?next=%2Fsettings/);
    await signIn(b.page, 'keeper@broodsilk.test');
    await expect.poll(() => b.page.url()).toMatch(/\/settings$/);
    await expect.poll(() => b.page.getByTestId('shell-user').textContent()).toBe('Mira Okonkwo');
    const file = await screenshot(b.page, 'signed-in-shell');
    expect(existsSync(file)).toBe(true);
  });

  it('refuses a wrong password with a message', async () => {
    const other = await openBrowser();
    try {
      await other.page.goto(`${BASE_URL}/sign-in`);
      await other.page.getByLabel(/^E-mail/).fill('keeper@broodsilk.test');
      await other.page.getByLabel(/^Password/).fill('not the demo password');
      await other.page.getByRole('button', { name: 'Sign in' }).click();
      await expect.poll(() => other.page.getByRole('alert').textContent()).toContain('The e-mail or password is not right.');
    } finally {
      await other.close();
    }
  });
});
