import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const BASE_URL = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:3000';
export const DEMO_PASSWORD = 'broodsilk-demo';
const SHOTS = path.join(path.dirname(new URL(import.meta.url).pathname), '..', 'screenshots');

export interface Browser {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/** A fresh Chromium profile per test file; phone-sized when asked. */
export async function openBrowser(options: { phone?: boolean } = {}): Promise<Browser> {
  const profile = mkdtempSync(path.join(tmpdir(), 'broodsilk-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport: options.phone ? { width: 390, height: 844 } : { width: 1280, height: 860 },
    isMobile: options.phone,
    hasTouch: options.phone,
    timezoneId: 'Europe/Berlin',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
      if (errors.length) throw new Error(`page errors: ${errors.join('; ')}`);
    },
  };
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  // Stay on a sign-in page we were sent to, so its ?next= is kept.
  if (!new URL(page.url()).pathname.startsWith('/sign-in')) await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel(/^E-mail/).fill(email);
  await page.getByLabel(/^Password/).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  // Either the shell appears or the form says why not; a refusal fails here with its own words.
  const shell = page.getByTestId('shell-user');
  const refusal = page.getByRole('alert').filter({ hasText: /\S/ });
  await shell.or(refusal).first().waitFor();
  if (!(await shell.isVisible())) throw new Error(`sign-in as ${email} refused: ${await refusal.first().textContent()}`);
}

export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(SHOTS, { recursive: true });
  const file = path.join(SHOTS, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
