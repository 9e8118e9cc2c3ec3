import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { BASE_URL, openBrowser, signIn, type Browser } from './support/browser';

/** Waits for a page to settle (the server answers in its own time); it does not measure anything. */
const eventually = <T>(read: () => Promise<T> | T) => expect.poll(read, { timeout: 15_000, interval: 100 });

// An invented season: her first sac is eaten, the first male is past use, a backup male is paired.
// Pairing to sac stays above the 120 days this species needs (species-groups data), so no warning interrupts.
const RUN = Date.now().toString(36);
const TITLE = `Pulchripes second try ${RUN}`;

/** A calendar date `days` before today as Mira (Europe/Berlin) sees it. */
function daysAgo(days: number): string {
  const today = new Intl.DateTimeFormat('en-CA', { timeZone: 'Europe/Berlin', year: 'numeric', month: '2-digit', day: '2-digit' }).format(new Date());
  const d = new Date(`${today}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() - days);
  return d.toISOString().slice(0, 10);
}

/** The API as the signed-in page calls it (session cookie and CSRF token), for the steps before the one under test. */
async function call<T>(page: Page, method: string, path: string, body?: unknown): Promise<T> {
  const res = await page.evaluate(
    async ({ method, path, body }) => {
      const csrf = ((await (await fetch('/api/auth/csrf', { credentials: 'same-origin' })).json()) as { csrfToken: string }).csrfToken;
      const r = await fetch(`/api${path}`, {
        method,
        credentials: 'same-origin',
        headers: { 'content-type': 'application/json', 'x-csrf-token': csrf },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      return { status: r.status, body: await r.json() };
    },
    { method, path, body },
  );
  if (res.status >= 300) throw new Error(`${method} ${path} answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body as T;
}

let keeper: Browser;
let projectId = '';
let backupLabel = '';

beforeAll(async () => {
  keeper = await openBrowser();
  const page = keeper.page;
  await signIn(page, 'keeper@broodsilk.test');
  const species = (await call<{ items: { id: string }[] }>(page, 'GET', '/species?q=pulchripes&limit=1')).items[0]!.id;
  const animal = (label: string, sex: 'female' | 'male', maturedDaysAgo?: number) =>
    call<{ id: string; label: string }>(page, 'POST', '/animals', {
      speciesId: species,
      label,
      sex,
      maturity: 'mature',
      ...(maturedDaysAgo ? { maturedOn: daysAgo(maturedDaysAgo) } : {}),
    });
  const female = await animal(`Tuff ${RUN}`, 'female');
  const first = await animal(`Flint ${RUN}`, 'male', 400);
  backupLabel = (await animal(`Slate ${RUN}`, 'male', 200)).label;
  projectId = (await call<{ id: string }>(page, 'POST', '/projects', { title: TITLE, femaleId: female.id, maleId: first.id })).id;
  await call(page, 'POST', `/projects/${projectId}/pairings`, {
    startedAt: `${daysAgo(300)}T18:00:00Z`,
    durationMinutes: 25,
    outcome: 'connected',
  });
  const sac = await call<{ id: string }>(page, 'POST', `/projects/${projectId}/sacs`, { layDate: daysAgo(150) });
  await call(page, 'PATCH', `/sacs/${sac.id}`, { outcome: 'failed', failureReason: 'eaten' });
});
afterAll(async () => {
  await keeper?.close();
});

describe('a sac eaten by the mother, then a second try with a backup male', () => {
  it('keeps the project open with advice, pairs her with the backup male and records a second sac', async () => {
    const page = keeper.page;
    await page.goto(`${BASE_URL}/projects/${projectId}`);
    await eventually(() => page.getByTestId('stage-setback').textContent()).toContain('The mother ate the sac');
    expect(await page.getByTestId('stage-current').textContent()).not.toContain('Ended early');

    const pairings = page.getByTestId('section-pairings');
    await pairings.getByRole('button', { name: 'Record a pairing' }).click();
    const form = pairings.getByTestId('pairing-form');
    await form.getByLabel('Male', { exact: true }).first().click();
    await page.getByRole('option', { name: `${backupLabel} (backup)` }).click();
    const day = form.getByLabel(/^Day the male went in/);
    await day.fill(daysAgo(130));
    await day.press('Tab');
    await form.getByRole('button', { name: 'Save pairing' }).click();
    await eventually(() => page.getByTestId('pairings-table').textContent()).toContain(backupLabel);
    await eventually(() => page.getByTestId('stage-current').textContent()).toContain('Waiting for sac');
    await eventually(() => page.getByTestId('project-animals').textContent()).toContain('Backup male');

    const sacs = page.getByTestId('section-sacs');
    await sacs.getByRole('button', { name: 'Record a sac' }).click();
    const lay = page.getByLabel(/^Lay date/).first();
    await lay.fill(daysAgo(2));
    await lay.press('Tab');
    await sacs.getByRole('button', { name: 'Save sac' }).click();
    await eventually(() => page.getByTestId('sac-card').count()).toBe(2);
    await eventually(() => page.getByTestId('stage-current').textContent()).toContain('Sac laid');
    expect(await page.getByTestId('stage-setback').count()).toBe(0);
  });
});
