import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import { BASE_URL, openBrowser, screenshot, signIn, type Browser } from './support/browser';
import { gradientPng } from './fixtures/png';

let b: Browser;
beforeAll(async () => {
  b = await openBrowser();
});
afterAll(async () => {
  await b.close();
});

// Unique per run, so the test can run again against the same database.
const label = `Rosa ${randomUUID().slice(0, 6)}`;

describe('collection', () => {
  it('the demo keeper adds an animal through a former species name, adds a photo and finds it in the table', async () => {
    const page = b.page;
    await page.goto(`${BASE_URL}/collection`);
    await page.waitForURL(/\/sign-in/);
    await signIn(page, 'keeper@broodsilk.test');
    await page.waitForURL(/\/collection$/);

    await page.getByRole('button', { name: 'Add animal' }).click();
    const form = page.getByRole('form', { name: 'Add animal' });
    await form.getByPlaceholder('Type a current or former name').fill('Brachypelma vagans');
    const option = page.getByRole('option', { name: /Tliltocatl vagans/ });
    await expect.poll(() => option.textContent()).toContain('formerly Brachypelma vagans');
    await option.click();
    await form.getByLabel(/^Label/).fill(label);
    await form.getByLabel(/^Enclosure/).fill('Rack B, shelf 2');
    await form.getByText('Female', { exact: true }).click();
    await form.getByRole('button', { name: 'Add to collection' }).click();

    // Saved: the animal's page, with the species' cautions.
    await page.waitForURL(/\/collection\/[0-9a-f-]{36}$/);
    await expect.poll(() => page.getByRole('heading', { level: 2 }).textContent()).toBe(label);
    await expect.poll(() => page.getByRole('note').textContent()).toContain('licensed practice');

    await page.getByTestId('photo-dropzone').locator('input[type=file]').setInputFiles({ name: 'rosa.png', mimeType: 'image/png', buffer: gradientPng() });
    const thumb = page.getByTestId('photo-grid').getByRole('img', { name: `${label}, photo 1` });
    await thumb.waitFor();
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0)).toBe(true);
    await screenshot(page, 'animal-page');

    await page.getByRole('link', { name: 'Collection' }).first().click();
    await page.getByLabel('Search', { exact: true }).fill(label);
    await page.waitForURL(/q=Rosa/);
    const row = page.getByRole('table', { name: 'Animals' }).getByRole('row').filter({ hasText: label });
    await expect.poll(() => row.count()).toBe(1);
    await expect.poll(() => row.textContent()).toContain('Tliltocatl vagans');
    expect(await row.textContent()).toContain('Rack B, shelf 2');
    const file = await screenshot(page, 'collection-table');
    expect(existsSync(file)).toBe(true);

    // A reload keeps the filter.
    await page.reload();
    await expect.poll(() => page.getByRole('table', { name: 'Animals' }).getByRole('row').filter({ hasText: label }).count()).toBe(1);
  });

  it('works on a phone: the table scrolls inside the page and the animal page stacks', async () => {
    const phone = await openBrowser({ phone: true });
    try {
      await phone.page.goto(`${BASE_URL}/sign-in`);
      await signIn(phone.page, 'keeper@broodsilk.test');
      await phone.page.goto(`${BASE_URL}/collection?q=${encodeURIComponent(label)}`);
      await phone.page.getByRole('table', { name: 'Animals' }).getByRole('link', { name: label }).waitFor();
      const widths = await phone.page.evaluate(() => ({ doc: document.documentElement.scrollWidth, view: window.innerWidth }));
      expect(widths.doc).toBeLessThanOrEqual(widths.view + 1);
      await screenshot(phone.page, 'collection-phone');
      await phone.page.getByRole('table', { name: 'Animals' }).getByRole('link', { name: label }).click();
      await phone.page.getByRole('heading', { level: 2, name: label }).waitFor();
      await screenshot(phone.page, 'animal-phone');
    } finally {
      await phone.close();
    }
  });
});

describe('mature males and the species catalogue', () => {
  it('lists mature males with the least time left first, and finds a species by its former name', async () => {
    const page = b.page;
    await page.goto(`${BASE_URL}/collection?view=males`);
    const days = page.getByTestId('days-left');
    await days.first().waitFor();
    const left = (await days.evaluateAll((els) => els.map((e) => Number(e.getAttribute('data-days'))))) as number[];
    expect(left.length).toBeGreaterThan(0);
    expect(left).toEqual([...left].sort((a, b) => a - b));
    await screenshot(page, 'mature-males');

    await page.goto(`${BASE_URL}/species`);
    await page.getByLabel('Search names').fill('Brachypelma vagans');
    const card = page.getByTestId('species-card').filter({ hasText: 'Tliltocatl vagans' });
    await expect.poll(() => card.count()).toBe(1);
    expect(await card.textContent()).toContain('formerly Brachypelma vagans');
    expect(await card.textContent()).toMatch(/Pull window.*day \d+–\d+/);
    await page.getByLabel('Search names').fill('');
    await page.getByTestId('species-card').nth(5).waitFor();
    await screenshot(page, 'species-catalogue');
  });

  it('shows the add form on a phone', async () => {
    const phone = await openBrowser({ phone: true });
    try {
      await phone.page.goto(`${BASE_URL}/sign-in`);
      await signIn(phone.page, 'keeper@broodsilk.test');
      await phone.page.goto(`${BASE_URL}/collection`);
      await phone.page.getByRole('button', { name: 'Add animal' }).click();
      const form = phone.page.getByRole('form', { name: 'Add animal' });
      await form.getByText('Male', { exact: true }).click();
      await form.getByText('Mature', { exact: true }).click();
      await form.getByRole('button', { name: 'Add to collection' }).click();
      await expect.poll(() => form.textContent()).toContain('needs the date of his maturing molt');
      await screenshot(phone.page, 'add-form-phone');
    } finally {
      await phone.close();
    }
  });
});
