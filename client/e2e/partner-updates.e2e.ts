/**
 * Issue 14: a partner hears what the keeper recorded. Two browsers at once: the keeper records a
 * sac as failed with her own message; the partner, signed in elsewhere, sees his inbox's unread
 * count rise without reloading, reads the update in plain words, follows it to the sac, and finds
 * the same update in his e-mail with the one-click unsubscribe headers (RFC 2369, RFC 8058).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { channelSendsEmail, type NotificationPage, type ProjectSummary, type ReminderPreferences } from '@broodsilk/shared';
import { BASE_URL, openBrowser, signIn, type Browser } from './support/browser';
import { callApi, daysAgo } from './support/api';
import { mailsTo, rawHeaders, type SinkMail } from './support/mail';

// The demo's loan project (server/src/seed/projects.seeder.ts): Mira runs it, Tomasz is a partner.
const PROJECT_TITLE = 'Regalis breeding loan with Tomasz';
const PARTNER = 'partner@broodsilk.test';
const RUN = Date.now().toString(36);
const MESSAGE = `Sorry, Tomasz: all the eggs went dark this week, we try again after her next meal (${RUN}).`;

/** The shell refreshes the unread count every 30 s (UNREAD_REFRESH_MS); a little more than one round. */
const UNREAD_WAIT_MS = 45_000;

/** Waits (up to a limit, not a measurement) for what a page shows after a refetch. */
const poll = <T>(fn: () => Promise<T> | T, timeout = 20_000) => expect.poll(fn, { timeout, interval: 250 });

/** Raw codes a reader must never see: kebab-case enum values (`in-progress`, `second-instar`, `carries-over`), dotted event kinds (`sac.failed`). */
const RAW_CODE = /\b[a-z]+(?:-[a-z]+)+\b|\b[a-z]+\.[a-z-]+\b/;
/** An ISO 8601 calendar date: the inbox writes dates in words (the e-mail keeps the stored ISO 8601 form). */
const ISO_DATE = /\b\d{4}-\d{2}-\d{2}\b/;

let keeper: Browser;
let partner: Browser;

const unreadOf = async (context: BrowserContext) => (await callApi<NotificationPage>(context, 'GET', '/notifications?limit=1')).unread;

beforeAll(async () => {
  keeper = await openBrowser();
  partner = await openBrowser();
});
afterAll(async () => {
  await keeper?.close();
  await partner?.close();
});

describe('partner updates', () => {
  it(
    'the keeper records a failed sac with her message; the partner sees the count rise, reads it in plain words, follows it, and gets the e-mail',
    { timeout: 150_000 },
    async () => {
      // The keeper: a new sac in the shared project (through the API; how it is laid is not this test's subject;
      // the partner hears of it too, before he signs in).
      const k = keeper.page;
      await k.goto(`${BASE_URL}/sign-in`);
      await signIn(k, 'keeper@broodsilk.test');
      const projects = await callApi<ProjectSummary[]>(keeper.context, 'GET', '/projects');
      const project = projects.find((x) => x.title === PROJECT_TITLE);
      if (!project) throw new Error(`no demo project "${PROJECT_TITLE}"`);
      const sac = await callApi<{ id: string }>(keeper.context, 'POST', `/projects/${project.id}/sacs`, {
        layDate: daysAgo(3),
        acknowledgedWarnings: ['sac-without-pairing', 'sac-soon-after-pairing', 'sac-long-after-pairing'],
        warningReason: 'A sac for the partner-update check.',
      });

      // The partner signs in on his own machine, on Today.
      const p = partner.page;
      await p.goto(`${BASE_URL}/sign-in`);
      await signIn(p, PARTNER);
      const before = await unreadOf(partner.context);
      const inboxLink = p.getByRole('link', { name: /^Inbox,/ });
      await poll(() => inboxLink.getAttribute('aria-label')).toBe(before ? `Inbox, ${before} unread` : 'Inbox, nothing unread');
      // A mark on this document: it is gone if the page is loaded again.
      await p.evaluate(() => document.body.setAttribute('data-no-reload', 'kept'));
      const preferences = await callApi<ReminderPreferences>(partner.context, 'GET', '/reminder-preferences');
      const mailBefore = (await mailsTo(PARTNER)).length;

      // She records it as failed on the sac page, with her own words, and reads first what Tomasz will get.
      await k.goto(`${BASE_URL}/sacs/${sac.id}`);
      await poll(() => k.getByTestId('sac-day-number').isVisible()).toBe(true);
      // Where the form waits behind its own button, she opens it first.
      const opener = k.getByRole('button', { name: 'Record that the sac failed' });
      if (await opener.count()) await opener.click();
      const form = k.getByRole('form', { name: 'The sac failed' });
      await form.getByRole('combobox', { name: 'The sac failed' }).click();
      await k.getByRole('option', { name: 'Infertile' }).click();
      await form.getByLabel(/^Your message to the partners/).fill(MESSAGE);
      await form.getByRole('button', { name: 'Show what the partners will read' }).click();
      const preview = k.getByTestId('failure-notice-preview');
      await poll(() => preview.textContent()).toContain(MESSAGE);
      expect(await preview.textContent()).toContain('One partner with an account gets it in the app and by e-mail, as they chose.');
      await form.getByRole('button', { name: 'Record as failed' }).click();
      await poll(() =>
        k
          .getByText(/^Failed/)
          .first()
          .textContent(),
      ).toBe('Failed: infertile');
      expect(await k.getByRole('form', { name: 'The sac failed' }).count()).toBe(0);

      // Tomasz's shell counts one more unread without a reload (it asks again by itself).
      await poll(() => inboxLink.getAttribute('aria-label'), UNREAD_WAIT_MS).toBe(`Inbox, ${before + 1} unread`);
      expect(await p.getByTestId('unread-count').textContent()).toBe(String(before + 1));
      expect(await p.evaluate(() => document.body.getAttribute('data-no-reload'))).toBe('kept');

      // He opens the inbox: the newest update is this one, in sentences.
      await inboxLink.click();
      await p.waitForURL(/\/notifications$/);
      const card = p.locator('[data-unread="true"]').filter({ hasText: MESSAGE });
      await poll(() => card.count()).toBe(1);
      const title = `${PROJECT_TITLE}: Sac failed`;
      const text = (await card.textContent())!;
      expect(text).toContain(title);
      expect(text).toMatch(/The sac laid \d{1,2} \w{3} \d{4} failed\. Reason: Infertile\./);
      expect(text).toContain('A message from Mira Okonkwo:');
      expect(text).toContain(`“${MESSAGE}”`);
      expect(text).toContain('Recorded by Mira Okonkwo.');
      expect(text).not.toMatch(RAW_CODE);
      expect(text).not.toMatch(ISO_DATE);

      // The update leads to its sac; following it marks it read.
      await card.getByRole('link', { name: title }).click();
      await p.waitForURL(new RegExp(`/sacs/${sac.id}$`));
      await poll(() =>
        p
          .getByText(/^Failed/)
          .first()
          .textContent(),
      ).toBe('Failed: infertile');
      await poll(() => unreadOf(partner.context)).toBe(before);

      // The e-mail, as his settings choose (the demo default: e-mail and in-app).
      const channel = preferences.channels['partner-update'];
      if (channelSendsEmail(channel)) {
        let mail: SinkMail | undefined;
        await poll(async () => {
          mail = (await mailsTo(PARTNER)).find((m) => (m.text ?? '').includes(MESSAGE));
          return mail !== undefined;
        }).toBe(true);
        expect(mail!.subject).toBe(`Broodsilk: ${title}`);
        expect(mail!.text).toMatch(new RegExp(`/sacs/${sac.id}\\b`));
        // The update's own words, before the link and the footer (addresses hold hyphens of their own).
        const words = mail!.text!.split('Open in Broodsilk')[0];
        expect(words).toContain(`“${MESSAGE}”`);
        expect(words).toMatch(/The sac laid \d{4}-\d{2}-\d{2} failed\. Reason: Infertile\./);
        expect(words).not.toMatch(RAW_CODE);
        // RFC 2369 §3.2: the address in angle brackets; RFC 8058 §3.1: one-click by POST.
        const headers = await rawHeaders(mail!.id);
        expect(headers['list-unsubscribe']).toMatch(new RegExp(`^<${BASE_URL}/api/unsubscribe/[^>\\s]+>$`));
        expect(headers['list-unsubscribe-post']).toBe('List-Unsubscribe=One-Click');
      } else {
        // Partner e-mails are off: nothing more reached him.
        await new Promise((r) => setTimeout(r, 2_000));
        expect((await mailsTo(PARTNER)).filter((m) => (m.text ?? '').includes(MESSAGE))).toEqual([]);
        expect((await mailsTo(PARTNER)).length).toBe(mailBefore);
      }
    },
  );
});
