import { AxeBuilder } from '@axe-core/playwright';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { BASE_URL, openBrowser, signIn, type Browser } from './support/browser';

/** WCAG 2.2 AA as axe-core tags it (axe-core docs, "Axe-core Tags"). */
const WCAG_AA = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'];
const SCHEMES = ['light', 'dark'] as const;
type Scheme = (typeof SCHEMES)[number];

const ACCOUNTS = ['keeper@broodsilk.test', 'partner@broodsilk.test', 'caretaker@broodsilk.test'];
const FIXED_ROUTES = ['/', '/collection', '/species', '/projects', '/projects/new', '/incubator', '/settings', '/settings/payouts', '/notifications'];
const PUBLIC_ROUTES = ['/sign-in', '/register', '/forgot-password', '/reset-password', '/confirm-email', '/no-such-page'];
/** Routes with an id: the first link of each kind found on the fixed pages. */
const LINKED = [/^\/collection\/[0-9a-f-]{36}$/, /^\/projects\/[0-9a-f-]{36}$/, /^\/sacs\/[0-9a-f-]{36}$/, /^\/incubator\/[0-9a-f-]{36}$/];

interface Finding {
  route: string;
  scheme: Scheme;
  rule: string;
  nodes: string[];
}

/** Sets the colour scheme the app keeps in localStorage (Mantine's colour scheme manager). */
async function setScheme(page: Page, scheme: Scheme) {
  await page.evaluate((s) => localStorage.setItem('mantine-color-scheme-value', s), scheme);
}

/** One page load, then axe over the whole document; the page's own title is checked too. */
async function audit(page: Page, route: string, scheme: Scheme, findings: Finding[], titles: Map<string, string>) {
  await page.goto(`${BASE_URL}${route}`);
  await page.waitForLoadState('networkidle');
  await page
    .locator('[data-loading="page"]')
    .waitFor({ state: 'detached', timeout: 10_000 })
    .catch(() => undefined);
  expect(await page.evaluate(() => document.documentElement.getAttribute('data-mantine-color-scheme'))).toBe(scheme);
  const result = await new AxeBuilder({ page }).withTags(WCAG_AA).analyze();
  for (const v of result.violations) findings.push({ route, scheme, rule: `${v.id}: ${v.help}`, nodes: v.nodes.slice(0, 3).map((n) => n.target.join(' ')) });
  titles.set(route, await page.title());
}

async function linkedRoutes(page: Page): Promise<string[]> {
  const hrefs = await page.evaluate(() => Array.from(document.querySelectorAll('a[href^="/"]'), (a) => a.getAttribute('href') ?? ''));
  return LINKED.map((pattern) => hrefs.find((h) => pattern.test(h))).filter((h): h is string => !!h);
}

describe('accessibility (axe-core, WCAG 2.2 AA) in both colour schemes', () => {
  let b: Browser;
  beforeAll(async () => {
    b = await openBrowser();
  });
  afterAll(async () => {
    await b.close();
  });

  it('public pages pass and each has its own title', { timeout: 300_000 }, async () => {
    const findings: Finding[] = [];
    const titles = new Map<string, string>();
    await b.page.goto(`${BASE_URL}/sign-in`);
    for (const scheme of SCHEMES) {
      await setScheme(b.page, scheme);
      for (const route of PUBLIC_ROUTES) await audit(b.page, route, scheme, findings, titles);
    }
    expect(findings).toEqual([]);
    expect(new Set(titles.values()).size).toBe(PUBLIC_ROUTES.length);
  });

  it('the usual guesses lead to sign-in: /login redirects and the register page links to it', async () => {
    await b.page.goto(`${BASE_URL}/login`);
    await b.page.waitForURL(/\/sign-in$/);
    await b.page.goto(`${BASE_URL}/register`);
    await b.page.getByRole('link', { name: 'Sign in' }).click();
    await b.page.waitForURL(/\/sign-in$/);
  });

  for (const account of ACCOUNTS) {
    it(`every page of ${account} passes and has its own title`, { timeout: 600_000 }, async () => {
      const page = b.page;
      await b.context.clearCookies();
      await signIn(page, account);
      const findings: Finding[] = [];
      const titles = new Map<string, string>();
      const routes = [...FIXED_ROUTES];
      for (const scheme of SCHEMES) {
        await setScheme(page, scheme);
        for (const route of routes) {
          await audit(page, route, scheme, findings, titles);
          if (scheme !== 'light') continue;
          for (const r of await linkedRoutes(page)) {
            const found = r.startsWith('/projects/') ? [r, `${r}/account`] : [r];
            for (const f of found) if (!routes.includes(f)) routes.push(f);
          }
        }
      }
      expect(findings).toEqual([]);
      // Every page says where you are; the detail pages may share a title only when they name the same thing.
      expect([...titles.values()].filter((t) => t === 'Broodsilk')).toEqual([]);
      expect(routes.length).toBeGreaterThan(FIXED_ROUTES.length);
    });
  }
});
