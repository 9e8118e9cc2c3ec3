import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import type { DashboardResponse, DashboardSac, ProjectSummary, RollStatus, SacResponse } from '@broodsilk/shared';
import { PULLED_TEST_SAC } from '@/testing/sac-incubation-fields';
import { renderWithProviders } from '@/testing/render';
import { DashboardView } from './dashboard-view';
import { i18next } from '@/lib/i18n';

function sac(id: string, roll: { status: RollStatus; due: string } | null, state: SacResponse['pullWindow']['state'] = 'open'): SacResponse {
  return {
    ...PULLED_TEST_SAC,
    id,
    projectId: `p-${id}`,
    pulled: !!roll,
    pulledAt: roll ? PULLED_TEST_SAC.pulledAt : null,
    pulledOn: roll ? PULLED_TEST_SAC.pulledOn : null,
    pullWindow: { ...PULLED_TEST_SAC.pullWindow, state },
    roll: roll ? { ...roll, lastRollAt: null } : null,
    incubatorCaution: null,
    inIncubator: !!roll,
  };
}

const item = (title: string, s: SacResponse): DashboardSac => ({ projectId: s.projectId, projectTitle: title, myRole: 'owner', sac: s });

const data: DashboardResponse = {
  today: '2026-12-01',
  dueToday: {
    rolls: [
      item('Regalis pair', sac('a', { status: 'overdue', due: '2026-12-01T05:00:00Z' })),
      item('Versicolor pair', sac('b', { status: 'due', due: '2026-12-01T10:00:00Z' })),
    ],
    pullWindows: [{ ...item('Hamorii pair', sac('c', null)), event: 'closes-today' }],
    readings: [],
    termsToAccept: [],
    handOversToConfirm: [],
    payments: [],
  },
  openProjects: [],
  openProjectCount: 0,
  upcomingPullWindows: [item('Albopilosum pair', sac('d', null, 'not-yet'))],
  matureMales: [],
  matureMaleCount: 0,
  recentActivity: [],
};

describe('DashboardView', () => {
  it('puts overdue rolls in clay and due rolls in amber, with their time in the viewer zone', () => {
    renderWithProviders(<DashboardView data={data} timeZone="Europe/Berlin" />);
    const rolls = screen.getByTestId('card-rolls');
    const statuses = within(rolls).getAllByTestId('roll-status');
    expect(statuses.map((s) => s.textContent)).toEqual(['Overdue', 'Due now']);
    expect(statuses[0]).toHaveClass('tone-failed');
    expect(statuses[1]).toHaveClass('tone-due');
    expect(within(rolls).getByText('Regalis pair')).toBeInTheDocument();
    expect(within(rolls).getByText('Tue, 1 Dec 2026, 06:00')).toBeInTheDocument();
    expect(within(rolls).getAllByRole('link', { name: 'Log a roll' })[0]).toHaveAttribute('href', '/incubator/a');
  });

  it('names a pull window closing today, and the upcoming ones with their dates', () => {
    renderWithProviders(<DashboardView data={data} timeZone="UTC" />);
    const today = screen.getByTestId('card-pull-today');
    expect(within(today).getByText('Hamorii pair')).toBeInTheDocument();
    expect(within(today).getByText('Closes today')).toHaveClass('tone-failed');
    const upcoming = screen.getByTestId('card-upcoming');
    expect(within(upcoming).getByText('Albopilosum pair')).toBeInTheDocument();
    expect(within(upcoming).getByText('22 Nov 2026 – 16 Dec 2026')).toBeInTheDocument();
    expect(screen.queryByText('Nothing needs doing right now.')).not.toBeInTheDocument();
  });

  const nothing = { rolls: [], pullWindows: [], readings: [], termsToAccept: [], handOversToConfirm: [], payments: [] };

  it('says so when nothing is due', () => {
    renderWithProviders(<DashboardView data={{ ...data, dueToday: nothing }} timeZone="UTC" />);
    expect(within(screen.getByTestId('card-rolls')).getByText('No roll is due.')).toBeInTheDocument();
    expect(screen.getByText('Nothing needs doing right now.')).toBeInTheDocument();
  });

  it('shows a reading outside the band as a to-do, in the viewer’s unit', () => {
    const hot = {
      ...sac('h', { status: 'upcoming', due: '2026-12-01T20:00:00Z' }),
      readingAlerts: [{ kind: 'temperature' as const, value: 30, at: '2026-12-01T06:00:00Z', side: 'above' as const }],
    };
    renderWithProviders(<DashboardView data={{ ...data, dueToday: { ...nothing, readings: [item('Hot pair', hot)] } }} timeZone="UTC" temperatureUnit="F" />);
    // 30 °C = 86 °F, 24 °C = 75.2 °F, 28 °C = 82.4 °F (NIST SP 811: t/°F = 1.8·t/°C + 32); band docs/trade-facts.md §4.
    expect(within(screen.getByTestId('card-readings')).getByTestId('reading-alert')).toHaveTextContent(
      'Temperature 86.0 °F, above the band (75.2 °F to 82.4 °F)',
    );
    expect(screen.queryByText('Nothing needs doing right now.')).not.toBeInTheDocument();
  });

  it('names a window open now, not only one opening today', () => {
    renderWithProviders(
      <DashboardView data={{ ...data, dueToday: { ...nothing, pullWindows: [{ ...item('Open pair', sac('e', null)), event: 'open' }] } }} timeZone="UTC" />,
    );
    expect(within(screen.getByTestId('card-pull-today')).getByTestId('pull-event')).toHaveTextContent('Open now');
    expect(screen.queryByText('Nothing needs doing right now.')).not.toBeInTheDocument();
  });

  it.each([
    ['terms to accept', { termsToAccept: [{ projectId: 'p1', projectTitle: 'Regalis pair', version: 2 }] }, 'Terms version 2 waits for your acceptance'],
    [
      'a hand-over to confirm',
      {
        handOversToConfirm: [{ projectId: 'p1', projectTitle: 'Regalis pair', entryId: 'e1', date: '2026-11-20', count: 5, partyName: 'Tomasz', mine: false }],
      },
      'Confirm that Tomasz received the 5 spiderlings handed over on 20 Nov 2026',
    ],
    [
      'a hand-over to me',
      {
        handOversToConfirm: [{ projectId: 'p1', projectTitle: 'Regalis pair', entryId: 'e1', date: '2026-11-20', count: 1, partyName: 'Tomasz', mine: true }],
      },
      'Confirm you received the spiderling handed over to you on 20 Nov 2026',
    ],
    [
      'money owed by me',
      {
        payments: [
          { projectId: 'p1', projectTitle: 'Regalis pair', direction: 'owed-by-me' as const, otherName: 'Tomasz', amountMinor: 1500, currency: 'EUR' },
        ],
      },
      'You owe Tomasz €15.00',
    ],
    [
      'money owed to me',
      {
        payments: [{ projectId: 'p1', projectTitle: 'Regalis pair', direction: 'owed-to-me' as const, otherName: 'Mira', amountMinor: 1500, currency: 'EUR' }],
      },
      'Mira owes you €15.00',
    ],
  ])('shows %s as a to-do, so Today is not "nothing"', (_kind, todo, text) => {
    renderWithProviders(<DashboardView data={{ ...data, dueToday: { ...nothing, ...todo } }} timeZone="UTC" />);
    expect(within(screen.getByTestId('card-account-todos')).getByText(text)).toBeInTheDocument();
    expect(screen.queryByText('Nothing needs doing right now.')).not.toBeInTheDocument();
  });

  describe('for a German reader', () => {
    afterEach(async () => {
      await i18next.changeLanguage('en');
    });

    it('says Today in German, with a decimal comma in the reading', async () => {
      await i18next.changeLanguage('de');
      const hot = {
        ...sac('h', { status: 'upcoming', due: '2026-12-01T20:00:00Z' }),
        readingAlerts: [{ kind: 'temperature' as const, value: 30.5, at: '2026-12-01T06:00:00Z', side: 'above' as const }],
      };
      renderWithProviders(<DashboardView data={{ ...data, dueToday: { ...nothing, readings: [item('Hot pair', hot)] } }} timeZone="UTC" />);
      // Decimal comma: Intl.NumberFormat('de-DE') (CLDR de); band 24–28 °C, docs/trade-facts.md §4.
      const de = (n: number) => new Intl.NumberFormat('de-DE', { minimumFractionDigits: 1, maximumFractionDigits: 1 }).format(n);
      expect(within(screen.getByTestId('card-readings')).getByTestId('reading-alert')).toHaveTextContent(
        `Temperatur ${de(30.5)} °C, über dem Zielbereich (${de(24)} °C bis ${de(28)} °C)`,
      );
      expect(within(screen.getByTestId('card-readings')).getByTestId('reading-alert')).toHaveTextContent('Temperatur 30,5 °C');
      expect(within(screen.getByTestId('card-rolls')).getByText('Kein Drehen fällig.')).toBeInTheDocument();
    });
  });
});

describe('open projects card', () => {
  const project = (n: number): ProjectSummary => ({
    id: `p${n}`,
    title: `Pair ${n}`,
    stage: { stage: 'paired' },
    myRole: 'owner',
    owner: { id: 'me', name: 'Me' },
    partners: [],
    female: { id: `f${n}`, label: `F-${n}`, scientificName: 'Tliltocatl vagans' },
    male: { id: `m${n}`, label: `M-${n}`, scientificName: 'Tliltocatl vagans' },
    endedOn: null,
    closedOn: null,
    createdAt: '2026-11-01T00:00:00Z',
    updatedAt: '2026-11-01T00:00:00Z',
  });

  it('links to all open projects when it lists only the newest', () => {
    renderWithProviders(<DashboardView data={{ ...data, openProjects: [project(1), project(2)], openProjectCount: 40 }} timeZone="UTC" />);
    const card = within(screen.getByTestId('card-projects'));
    expect(card.getByRole('link', { name: 'All 40 open projects' })).toHaveAttribute('href', '/projects');
  });

  it('has no such link when it lists them all', () => {
    renderWithProviders(<DashboardView data={{ ...data, openProjects: [project(1), project(2)], openProjectCount: 2 }} timeZone="UTC" />);
    expect(within(screen.getByTestId('card-projects')).queryByRole('link', { name: /open projects/ })).toBeNull();
  });
});

describe('mature males card', () => {
  it('links to every mature male in the collection when it lists only the most urgent', () => {
    renderWithProviders(<DashboardView data={{ ...data, matureMales: [], matureMaleCount: 20 }} timeZone="UTC" />);
    const link = within(screen.getByTestId('card-males')).getByRole('link', { name: 'All 20 mature males' });
    expect(link).toHaveAttribute('href', '/collection?view=males');
  });
});
