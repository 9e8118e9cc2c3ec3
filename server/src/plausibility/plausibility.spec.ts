import { describe, expect, it } from 'vitest';
import { plausibilityWarning, type ApiErrorBody } from '@broodsilk/shared';
import { errorBody } from '../common/filters/error-body';
import { inReaderLanguage } from '../common/filters/reader-language';
import { acceptWarnings } from './plausibility';

/** Two warnings an opening can raise together (egg count beyond the species' usual range, and a count above the estimate). */
const TWO = [
  plausibilityWarning('eggs-outside-species-range', { total: 1200, min: 400, max: 1000 }, 'eggsMore'),
  plausibilityWarning('count-above-estimate', { previous: 150, on: '2025-10-19', alive: 180 }),
];

function refused(found = TWO): ApiErrorBody {
  try {
    acceptWarnings(found, {});
  } catch (e) {
    return errorBody(e);
  }
  throw new Error('acceptWarnings let unacknowledged warnings through');
}

describe('acceptWarnings: the 422 for unacknowledged warnings', () => {
  it('counts several warnings in its summary and says each once, in its detail (English)', () => {
    const body = inReaderLanguage(refused(), 'en');
    expect(body.statusCode).toBe(422);
    expect(body.message).toBe('Please check these 2 things before saving; each is listed below.');
    expect(body.details!.map((d) => d.message)).toEqual([
      '1200 eggs and young is more than this species usually lays (400–1000 a sac). Check the count, or save it with a reason.',
      'About 150 were alive by the estimate on 2025-10-19; 180 is more than that. Save it if the estimate was low.',
    ]);
  });

  it('says the summary and every warning in German, quoting no English sentence', () => {
    const body = inReaderLanguage(refused(), 'de');
    expect(body.message).toBe('Bitte prüfe vor dem Speichern diese 2 Dinge; jedes steht unten.');
    expect(body.details!.map((d) => d.message)).toEqual([
      '1200 Eier und Jungtiere sind mehr, als diese Art meist legt (400–1000 pro Kokon). Prüf die Zählung oder speichere mit einer Begründung.',
      'Laut Schätzung vom 2025-10-19 lebten etwa 150; 180 sind mehr. Speichere trotzdem, wenn die Schätzung zu niedrig war.',
    ]);
  });

  it('with one warning the summary is that warning, in the reader’s language', () => {
    const body = inReaderLanguage(refused(TWO.slice(1)), 'de');
    expect(body.message).toBe(body.details![0]!.message);
    expect(body.message).toMatch(/^Laut Schätzung/);
  });
});
