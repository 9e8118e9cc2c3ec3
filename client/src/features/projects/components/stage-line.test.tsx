import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { ENDED_EARLY_REASONS, PROJECT_STAGE_LINE } from '@broodsilk/shared';
import { renderWithProviders } from '@/testing/render';
import { i18next } from '@/lib/i18n';
import { StageBadge, StageLine } from './stage-line';

const NAMES = ['Planned', 'Paired', 'Waiting for sac', 'Sac laid', 'In incubator', 'Brood', 'Shares settled', 'Closed'];

function steps() {
  return within(screen.getByTestId('stage-line')).getAllByRole('listitem');
}

describe('StageLine', () => {
  it.each(PROJECT_STAGE_LINE.map((s, i) => [s, i] as const))('marks %s as the current step with the ones before it done', (stage, index) => {
    renderWithProviders(<StageLine stage={{ stage }} />);
    const items = steps();
    expect(items).toHaveLength(8);
    items.forEach((item, i) => {
      expect(item).toHaveAttribute('data-state', i < index ? 'done' : i === index ? 'current' : 'ahead');
    });
    expect(items[index]).toHaveAttribute('aria-current', 'step');
    expect(screen.getByTestId('stage-current')).toHaveTextContent(`${NAMES[index]} · step ${index + 1} of 8`);
  });

  it('does not call "Paired" done for a sac with no pairing recorded', () => {
    renderWithProviders(<StageLine stage={{ stage: 'sac-laid', unrecorded: ['paired'] }} />);
    const items = steps();
    expect(items.map((i) => i.getAttribute('data-state'))).toEqual(['done', 'unrecorded', 'done', 'current', 'ahead', 'ahead', 'ahead', 'ahead']);
    expect(items[1]).toHaveTextContent('Paired: not recorded');
  });

  it.each([
    ['no-sac', 'Ended early: no sac'],
    ['female-molted', 'Ended early: the female molted'],
    ['sac-failed', 'Ended early: the sac failed'],
    ['sac-eaten', 'Ended early: the sac was eaten'],
    ['male-died', 'Ended early: the male died before pairing'],
  ] as const)('shows an early end for %s with its reason and no current step', (reason, text) => {
    renderWithProviders(<StageLine stage={{ stage: 'ended-early', reason }} note="Waited ten months" />);
    const current = screen.getByTestId('stage-current');
    expect(current).toHaveTextContent(text);
    expect(current).toHaveClass('tone-failed');
    expect(screen.getByText(/Waited ten months/)).toBeInTheDocument();
    for (const item of steps()) {
      expect(item).toHaveAttribute('data-state', 'ended');
      expect(item).not.toHaveAttribute('aria-current');
    }
  });

  it('covers every early-end reason the shared list knows', () => {
    expect([...ENDED_EARLY_REASONS].sort()).toEqual(['female-molted', 'male-died', 'no-sac', 'sac-eaten', 'sac-failed']);
  });
  it('shows a setback as advice on an open stage, not as an end', () => {
    renderWithProviders(<StageLine stage={{ stage: 'planned', setback: 'sac-eaten', sacId: 's1' }} />);
    expect(screen.getByTestId('stage-current')).toHaveTextContent('Planned · step 1 of 8');
    expect(screen.getByTestId('stage-setback')).toHaveTextContent('The mother ate the sac');
    expect(screen.queryByText('Ended early')).not.toBeInTheDocument();
  });
  it('names a setback on the badge of an open project', () => {
    renderWithProviders(<StageBadge stage={{ stage: 'paired', setback: 'female-molted' }} />);
    expect(screen.getByTestId('stage-badge')).toHaveTextContent('Paired · the female molted');
  });
});

describe('StageLine words', () => {
  afterEach(async () => {
    await i18next.changeLanguage('en');
  });

  it('names the steps and their state in German for a German reader', async () => {
    await i18next.changeLanguage('de');
    renderWithProviders(<StageLine stage={{ stage: 'sac-laid', unrecorded: ['paired'] }} />);
    expect(screen.getByTestId('stage-current')).toHaveTextContent('Kokon gebaut · Schritt 4 von 8');
    expect(steps()[1]).toHaveTextContent('Verpaart: nicht eingetragen');
    expect(screen.getByTestId('stage-line')).toHaveAttribute('aria-label', 'Stand des Projekts');
  });
});
