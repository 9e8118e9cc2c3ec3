import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { femaleReadiness, type FemaleReadinessView } from '@broodsilk/shared';
import { i18next } from '@/lib/i18n';
import { renderWithProviders } from '@/testing/render';
import { ReadinessPanel } from './readiness-panel';

afterEach(async () => {
  await i18next.changeLanguage('en');
});

const TODAY = '2026-06-30';

/** The panel's input as the server builds it: the shared rule's result plus the dates it came from. */
function view(lastMoltOn: string | null, premoltSince: string | null = null): FemaleReadinessView {
  return { ...femaleReadiness(lastMoltOn, TODAY, premoltSince), lastMoltOn, premoltNote: null, premoltSince };
}

describe('ReadinessPanel', () => {
  // The shared rule (shared/src/collection/female-readiness.ts) writes the advice in English; the panel
  // says it from the catalogue, so in English both must read the same.
  it.each([
    ['no molt recorded', view(null)],
    ['hardening, 20 days after a molt (one day left)', view('2026-06-10')],
    ['hardening, 1 day after a molt', view('2026-06-29')],
    ['ready, 40 days after a molt', view('2026-05-21')],
  ])('gives the advice of the shared rule in English: %s', async (_name, readiness) => {
    renderWithProviders(<ReadinessPanel readiness={readiness} />);
    // The shared rule says "1 more days"; the catalogue's plural says "1 more day".
    expect(await screen.findByText(readiness.note.replace('about 1 more days', 'about 1 more day'))).toBeInTheDocument();
  });

  it('names the premolt day in the interface format', async () => {
    renderWithProviders(<ReadinessPanel readiness={view('2026-04-01', '2026-06-20')} />);
    expect(
      await screen.findByText(
        'Not now: in premolt since 20 Jun 2026. Pairing her now would be lost with the coming molt; wait until she has molted and hardened (about 21 days).',
      ),
    ).toBeInTheDocument();
  });

  it('gives the advice in German when the interface is German', async () => {
    await i18next.changeLanguage('de');
    renderWithProviders(<ReadinessPanel readiness={view('2026-06-10')} />);
    expect(
      await screen.findByText('Gehäutet vor 20 Tagen. Gib ihrer neuen Haut Zeit zum Aushärten, bevor du sie verpaarst (noch etwa 1 Tag).'),
    ).toBeInTheDocument();
    expect(screen.getByText('Verpaarungsbereitschaft')).toBeInTheDocument();
  });
});
