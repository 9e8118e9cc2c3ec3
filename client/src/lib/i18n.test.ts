import { afterEach, describe, expect, it } from 'vitest';
import { i18next, words } from './i18n';

describe('sentences from the catalogue', () => {
  afterEach(async () => {
    await i18next.changeLanguage('en');
  });

  // Server sentences carry ISO 8601 calendar dates; the reader sees the interface's one date format
  // (the reference is Intl.DateTimeFormat itself, in the reader's language).
  it('shows ISO 8601 dates in a sentence in the interface’s date format, in English and German', async () => {
    await i18next.changeLanguage('en');
    const en = words('warning.male-died-after-pairing', { named: '', died: '2026-10-03', paired: '2026-07-05' });
    const gb = (d: number, m: number) =>
      new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(Date.UTC(2026, m - 1, d)));
    expect(en).toContain(gb(3, 10));
    expect(en).toContain(gb(5, 7));
    expect(en).not.toMatch(/\d{4}-\d{2}-\d{2}/);

    await i18next.changeLanguage('de');
    const de = words('warning.male-died-after-pairing', { named: '', died: '2026-10-03', paired: '2026-07-05' });
    const deDate = new Intl.DateTimeFormat('de-DE', { timeZone: 'UTC', day: 'numeric', month: 'short', year: 'numeric' }).format(
      new Date(Date.UTC(2026, 9, 3)),
    );
    expect(de).toContain(deDate);
    expect(de).toMatch(/^Das Männchen/);
  });

  it('leaves values that are not calendar dates as they are', () => {
    expect(words('warning.loan-overdue', { named: ' MO-042', dueBack: '2026-05-29', count: 3 })).toContain('MO-042');
  });
});

describe('stored sentences', () => {
  it('show their ISO 8601 dates in the interface’s date format and keep the rest', async () => {
    const { withReadableDates } = await import('./dates');
    const gb = new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(Date.UTC(2026, 10, 6)));
    expect(withReadableDates('Roll (sac laid 2026-11-06).')).toBe(`Roll (sac laid ${gb}).`);
    expect(withReadableDates('Counted 120 alive.')).toBe('Counted 120 alive.');
  });
});
