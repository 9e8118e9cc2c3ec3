import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { wordsFor, type SacResponse } from '@broodsilk/shared';
import { PULLED_TEST_SAC } from '@/testing/sac-incubation-fields';
import { renderWithProviders } from '@/testing/render';
import { SacOverview } from './sac-overview';

const withWindow = (pullWindow: Partial<SacResponse['pullWindow']>): SacResponse => ({
  ...PULLED_TEST_SAC,
  pullWindow: { ...PULLED_TEST_SAC.pullWindow, ...pullWindow },
});

describe('SacOverview: where the pull window comes from', () => {
  it('names the species figure and its source', () => {
    const sac = withWindow({ fromDay: 21, toDay: 30, origin: 'species', source: { kind: 'memory', note: 'usual pull days for Poecilotheria' } });
    renderWithProviders(<SacOverview sac={sac} timeZone="UTC" temperatureUnit="C" />);
    expect(screen.getByTestId('pull-window-origin')).toHaveTextContent('Day 21–30: the figure for this species');
    expect(screen.getByTestId('pull-window-source')).toHaveTextContent('Source: from memory');
  });

  it('says the day 21–45 window is the usual one, common practice (docs/trade-facts.md §2)', () => {
    renderWithProviders(<SacOverview sac={withWindow({ origin: 'default', source: { kind: 'common-practice' } })} timeZone="UTC" temperatureUnit="C" />);
    expect(screen.getByTestId('pull-window-origin')).toHaveTextContent('Day 21–45: the usual window for any species');
    expect(screen.getByTestId('pull-window-source')).toHaveTextContent('Source: common practice');
  });

  it('says when the keeper set the window for this sac, with no source', () => {
    renderWithProviders(<SacOverview sac={withWindow({ fromDay: 25, toDay: 40, origin: 'sac', source: null })} timeZone="UTC" temperatureUnit="C" />);
    expect(screen.getByTestId('pull-window-origin')).toHaveTextContent('Day 25–40: your own window for this sac');
    expect(screen.queryByTestId('pull-window-source')).not.toBeInTheDocument();
  });
});

describe('SacOverview: recording a failure', { timeout: 30_000 }, () => {
  const t = wordsFor('en');

  it('keeps the failure form folded away until its button is pressed, and folds it again on cancel', async () => {
    renderWithProviders(<SacOverview sac={PULLED_TEST_SAC} timeZone="UTC" temperatureUnit="C" />);
    expect(screen.queryByRole('form', { name: t('page.failureNotice.reasonLabel') })).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: t('page.sacs.failure.open') }));
    expect(screen.getByRole('form', { name: t('page.failureNotice.reasonLabel') })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: t('page.sacs.failure.open') })).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: t('page.shell.cancel') }));
    expect(screen.queryByRole('form', { name: t('page.failureNotice.reasonLabel') })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: t('page.sacs.failure.open') })).toBeInTheDocument();
  });

  it('offers no failure button to a viewer who may not edit the sac', () => {
    renderWithProviders(<SacOverview sac={{ ...PULLED_TEST_SAC, may: { ...PULLED_TEST_SAC.may, edit: false } }} timeZone="UTC" temperatureUnit="C" />);
    expect(screen.queryByRole('button', { name: t('page.sacs.failure.open') })).not.toBeInTheDocument();
  });
});
