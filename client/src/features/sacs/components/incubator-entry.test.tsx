import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { INCUBATOR_CAUTION, addDays, todayIn, type SacResponse } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { IncubatorEntry } from './incubator-entry';

afterEach(() => vi.unstubAllGlobals());

const sac: SacResponse = {
  id: 's1',
  projectId: 'p1',
  layDate: '2026-11-01',
  dayNumber: 30,
  today: '2026-12-01',
  pulled: true,
  pulledAt: '2026-11-25T07:00:00Z',
  pulledOn: '2026-11-25',
  outcome: 'in-progress',
  failureReason: null,
  pullWindow: {
    fromDay: 21,
    toDay: 45,
    origin: 'default',
    opensOn: '2026-11-22',
    closesOn: '2026-12-16',
    closingFrom: '2026-12-14',
    dayNumber: 30,
    state: 'open',
    daysUntilOpens: 0,
    daysUntilCloses: 15,
    daysPastClose: 0,
  },
  rollIntervalHours: 12,
  rollingOff: false,
  roll: { due: '2026-12-01T07:00:00Z', status: 'overdue', lastRollAt: '2026-11-30T19:00:00Z' },
  broodStage: 'eggs',
  opened: false,
  currentCount: null,
  currentCountEstimated: false,
  notes: null,
  warningReason: null,
  incubatorCaution: INCUBATOR_CAUTION,
  createdAt: '2026-11-01T10:00:00Z',
  updatedAt: '2026-11-30T19:00:00Z',
};

const entry = (kind: string) => ({
  id: 'e1',
  sacId: 's1',
  kind,
  at: '2026-12-01T09:30:00Z',
  author: { id: 'u', name: 'Ines' },
  temperatureC: null,
  entered: null,
  humidityPercent: null,
  stage: null,
  text: null,
  strikes: null,
  struck: null,
  createdAt: '2026-12-01T09:30:00Z',
});

describe('IncubatorEntry', () => {
  it('sends a roll entry when "Rolled now" is tapped and says when it was logged', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/sacs/s1/log': () => ({ status: 201, body: entry('roll') }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<IncubatorEntry sac={sac} timeZone="Europe/Berlin" temperatureUnit="C" />);
    expect(screen.getByTestId('next-roll')).toHaveTextContent('Roll overdue');
    await userEvent.click(screen.getByRole('button', { name: 'Rolled now' }));
    expect(await screen.findByTestId('entry-done')).toHaveTextContent('Roll logged at Tue, 1 Dec 2026, 10:30.');
    const posts = calls.filter((c) => c.method === 'POST' && c.path === '/api/sacs/s1/log');
    expect(posts).toHaveLength(1);
    expect(posts[0]!.body).toEqual({ kind: 'roll' });
  });

  it("shows the server's message when the roll is refused", async () => {
    vi.stubGlobal(
      'fetch',
      stubFetch({
        'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
        'POST /api/sacs/s1/log': () => ({
          status: 403,
          body: { statusCode: 403, error: 'Forbidden', message: 'Only the keeper and the caretaker can log on this sac.' },
        }),
      }).fetchStub,
    );
    renderWithProviders(<IncubatorEntry sac={sac} timeZone="Europe/Berlin" temperatureUnit="C" />);
    await userEvent.click(screen.getByRole('button', { name: 'Rolled now' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Only the keeper and the caretaker can log on this sac.');
    expect(screen.queryByTestId('entry-done')).not.toBeInTheDocument();
  });

  it('sends the temperature in the unit it was typed in, with the humidity', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/sacs/s1/log': () => ({ status: 201, body: entry('temperature') }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<IncubatorEntry sac={sac} timeZone="UTC" temperatureUnit="F" />);
    await userEvent.type(screen.getByLabelText('Temperature (°F)'), '78.5');
    await userEvent.type(screen.getByLabelText('Humidity (%)'), '75');
    await userEvent.click(screen.getByRole('button', { name: 'Save readings' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(2));
    expect(calls.filter((c) => c.method === 'POST').map((c) => c.body)).toEqual([
      { kind: 'temperature', temperature: { value: 78.5, unit: 'F' } },
      { kind: 'humidity', humidityPercent: 75 },
    ]);
  });

  it('shows the heat-source caution and the species cautions it is given', () => {
    vi.stubGlobal('fetch', stubFetch({}).fetchStub);
    renderWithProviders(<IncubatorEntry sac={sac} timeZone="UTC" temperatureUnit="C" speciesCautions={['Medically significant venom: work with tools.']} />);
    const caution = screen.getByTestId('heat-caution');
    expect(caution).toHaveTextContent(/thermostat/);
    expect(caution).toHaveTextContent('Medically significant venom: work with tools.');
  });

  it('offers the pull instead of a roll while the sac is with the mother', () => {
    vi.stubGlobal('fetch', stubFetch({}).fetchStub);
    renderWithProviders(
      <IncubatorEntry sac={{ ...sac, pulled: false, pulledAt: null, pulledOn: null, roll: null, incubatorCaution: null }} timeZone="UTC" temperatureUnit="C" />,
    );
    expect(screen.queryByRole('button', { name: 'Rolled now' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Pulled now, into the incubator' })).toBeInTheDocument();
    expect(screen.getByTestId('heat-caution')).toHaveTextContent(/thermostat/);
  });
});

// A loaded machine renders these slowly; nothing here is timed.
describe('IncubatorEntry: typed readings and the pull', { timeout: 30_000 }, () => {
  it('refuses a humidity of 150 with a message instead of clamping it to 100, and sends nothing', async () => {
    const { fetchStub, calls } = stubFetch({});
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<IncubatorEntry sac={sac} timeZone="UTC" temperatureUnit="C" />);
    const humidity = screen.getByLabelText('Humidity (%)');
    await userEvent.type(humidity, '150');
    expect(humidity).toHaveAccessibleDescription('150 is out of range: give a number from 0 to 100.');
    await userEvent.click(screen.getByRole('button', { name: 'Save readings' }));
    expect(humidity).toHaveValue('150');
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('asks before recording the pull, warns on a day before the window and sends the earlier time given', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'PATCH /api/sacs/s1': () => ({ status: 200, body: { ...sac } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const layDate = addDays(todayIn('UTC', new Date()), -40);
    const withMother = {
      ...sac,
      layDate,
      pulled: false,
      pulledAt: null,
      pulledOn: null,
      roll: null,
      pullWindow: { ...sac.pullWindow, fromDay: 30, toDay: 45 },
    };
    renderWithProviders(<IncubatorEntry sac={withMother} timeZone="UTC" temperatureUnit="C" />);
    await userEvent.click(screen.getByRole('button', { name: 'Pulled now, into the incubator' }));
    const dialog = await screen.findByRole('dialog', { name: 'Record the pull' });
    expect(calls.filter((c) => c.method === 'PATCH')).toHaveLength(0);

    const day22 = addDays(layDate, 22);
    const date = within(dialog).getByLabelText('Pulled on');
    await userEvent.clear(date);
    await userEvent.type(date, day22);
    const time = within(dialog).getByLabelText('At');
    await userEvent.clear(time);
    await userEvent.type(time, '07:15');
    expect(within(dialog).getByTestId('confirm-warning')).toHaveTextContent("That is day 22, before this sac's pull window (days 30–45)");
    await userEvent.click(within(dialog).getByRole('button', { name: 'Record the pull' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'PATCH')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ pulledAt: `${day22}T07:15:00.000Z` });
  });
});
