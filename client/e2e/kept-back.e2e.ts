import { AxeBuilder } from '@axe-core/playwright';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { BASE_URL, openBrowser, screenshot, signIn, type Browser } from './support/browser';

// The demo's murinus pair: Mira runs it, Tomasz is a partner, Ines rolls (from the demo seed).
const PROJECT_TITLE = 'Murinus: the dud sac';
const ZONE = 'Europe/Berlin'; // Mira's time zone in the demo; the day fields are read in it
const REASON = 'All five turned dark and collapsed.';

/** Waits (up to a limit, not a measurement) for what the page shows after a refetch. */
const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 20_000, interval: 250 });
/** The calendar day `days` before now in Mira's zone, as ISO 8601 (the date field reads that form). */
const dayAgo = (days: number) => new Intl.DateTimeFormat('en-CA', { timeZone: ZONE }).format(new Date(Date.now() - days * 86_400_000));

/** WCAG 2.2 AA as axe-core tags it (axe-core docs, "Axe-core Tags"); the panels' forms and tables on a phone. */
const axeViolations = async (page: Page) =>
  (await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa']).analyze()).violations.map(
    (v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`,
  );

let keeper: Browser;
let partner: Browser;

/** A new sac of the demo project, laid 40 days ago and pulled 15 days ago, through the API the pages use. */
async function newPulledSac(page: Page): Promise<string> {
  return page.evaluate(
    async ({ title, layDate, pulledAt }) => {
      const json = async (res: Response) => {
        if (!res.ok) throw new Error(`${res.status} ${await res.text()}`);
        return res.json();
      };
      const { csrfToken } = await json(await fetch('/api/auth/csrf'));
      const list = await json(await fetch('/api/projects'));
      const project = (list.items ?? list).find((p: { title: string }) => p.title === title);
      if (!project) throw new Error(`No demo project "${title}"`);
      const sac = await json(
        await fetch(`/api/projects/${project.id}/sacs`, {
          method: 'POST',
          headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken },
          body: JSON.stringify({
            layDate,
            pulledAt,
            // The demo pairing's timing is not what this spec is about.
            acknowledgedWarnings: ['sac-without-pairing', 'sac-soon-after-pairing', 'sac-long-after-pairing'],
            warningReason: 'A later sac for the kept-back check.',
          }),
        }),
      );
      return sac.id as string;
    },
    { title: PROJECT_TITLE, layDate: dayAgo(40), pulledAt: new Date(Date.now() - 15 * 86_400_000).toISOString() },
  );
}

beforeAll(async () => {
  keeper = await openBrowser({ phone: true });
  partner = await openBrowser({ phone: true });
});
afterAll(async () => {
  await keeper?.close();
  await partner?.close();
});

describe('eggs kept back at an opening', () => {
  it(
    'an infertile sac opened with 5 kept back, the batch rolled for two days on a phone, written off; the partner reads it in plain words',
    { timeout: 120_000 },
    async () => {
      const page = keeper.page;
      await page.goto(`${BASE_URL}/sign-in`);
      await signIn(page, 'keeper@broodsilk.test');
      const sacId = await newPulledSac(page);
      await page.goto(`${BASE_URL}/sacs/${sacId}`);

      // The opening: mostly dark and spoiled eggs, five doubtful ones kept back; opened three days ago.
      await page.getByLabel('Healthy eggs').fill('5');
      await page.getByLabel('Dark (non-viable)').fill('150');
      await page.getByLabel('Spoiled').fill('40');
      await page.getByLabel('Kept back for more incubation').fill('5');
      await page.getByRole('button', { name: 'Save opening' }).click();
      const confirm = page.getByRole('dialog', { name: 'Record the opening' });
      expect(await confirm.textContent()).toContain('except the 5 kept back');
      await confirm.getByLabel('Opened on').fill(dayAgo(3));
      await confirm.getByLabel('At').fill('09:00');
      await confirm.getByRole('button', { name: 'Record the opening' }).click();
      const words = page.getByTestId('kept-back-words');
      await poll(() => words.textContent()).toContain('5 eggs kept back at the opening');
      expect(await words.textContent()).toContain('still incubating, not rolled yet');

      // Two days of rolls, morning and evening, recorded with their past times.
      const logForm = page.getByRole('form', { name: 'Log the kept-back eggs' });
      const rolls: [number, string][] = [
        [2, '08:00'],
        [2, '20:00'],
        [1, '08:00'],
        [1, '20:00'],
      ];
      for (const [n, [days, time]] of rolls.entries()) {
        await logForm.getByLabel('Day', { exact: true }).fill(dayAgo(days));
        await logForm.getByLabel('Time', { exact: true }).fill(time);
        await logForm.getByRole('button', { name: 'Save the roll' }).click();
        await poll(() => words.textContent()).toContain(`rolled ${n === 0 ? 'once' : `${n + 1} times`}`);
      }
      expect(await page.getByRole('table', { name: 'Log of the kept-back eggs' }).getByRole('row').count()).toBe(5); // header + 4 rolls

      expect(await axeViolations(page)).toEqual([]);

      // Written off, asked once.
      const endForm = page.getByRole('form', { name: 'End the kept-back batch' });
      await endForm.getByLabel('Why').fill(REASON);
      await endForm.getByRole('button', { name: 'Write them off' }).click();
      await page.getByRole('dialog', { name: 'Write them off' }).getByRole('button', { name: 'Write them off' }).click();
      await poll(() => words.textContent()).toContain('did not develop: written off on');
      expect(await page.getByRole('form', { name: 'Log the kept-back eggs' }).count()).toBe(0);
      await screenshot(page, 'kept-back-written-off-phone');

      // The partner signs in and reads the outcome; he is offered nothing to change.
      const p = partner.page;
      await p.goto(`${BASE_URL}/sacs/${sacId}`);
      await p.waitForURL(/\/sign-in/);
      await signIn(p, 'partner@broodsilk.test');
      await p.waitForURL(new RegExp(`/sacs/${sacId}$`));
      const told = p.getByTestId('kept-back-words');
      await poll(() => told.textContent()).toContain(`(All five turned dark and collapsed). They are not part of the brood.`);
      expect(await told.textContent()).toMatch(/^The 5 eggs kept back at the opening on .+ for more incubation did not develop: written off on /);
      expect(await p.getByRole('button', { name: 'Write them off' }).count()).toBe(0);
      expect(await p.getByRole('form', { name: 'Log the kept-back eggs' }).count()).toBe(0);
      expect(await axeViolations(p)).toEqual([]);
      await screenshot(p, 'kept-back-partner-phone');
    },
  );
});
