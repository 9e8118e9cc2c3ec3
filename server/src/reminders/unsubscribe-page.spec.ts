import { describe, expect, it } from 'vitest';
import { LANGUAGES } from '@broodsilk/shared';
import { unsubscribePage, type UnsubscribeStep } from './unsubscribe-page';

const STEPS: UnsubscribeStep[] = [{ step: 'ask', kind: 'roll-due' }, { step: 'done', kind: 'partner-update' }, { step: 'bad-link' }, { step: 'account-gone' }];

describe('the unsubscribe page', () => {
  for (const lng of LANGUAGES) {
    it(`says every step in ${lng}, with finished words, and offers the button only before stopping`, () => {
      const titles = new Set<string>();
      for (const s of STEPS) {
        const html = unsubscribePage(lng, s);
        expect(html).toContain(`<html lang="${lng}">`);
        expect(html).not.toMatch(/\{\{|\}\}|(?<![-\w])(reminders|notificationKind)\.[\w-]/);
        // A GET changes nothing (RFC 8058 §3.2): only the asking page has a form, and it POSTs.
        expect(html.includes('<form method="post">'), s.step).toBe(s.step === 'ask');
        titles.add(/<h1[^>]*>([^<]+)<\/h1>/.exec(html)![1]);
      }
      expect(titles.size).toBe(3); // a broken link and a gone account share a heading; their messages differ
    });
  }

  it('names the kind in the reader’s language (the settings page’s words)', () => {
    expect(unsubscribePage('de', { step: 'done', kind: 'partner-update' })).toContain('zu „Neuigkeiten aus einem Projekt, an dem du beteiligt bist“');
    expect(unsubscribePage('en', { step: 'ask', kind: 'roll-due' })).toContain('Stop e-mails for “A roll falls due”?');
  });
});
