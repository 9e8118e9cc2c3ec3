import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { addDays, todayIn, type CareLogKind } from '@broodsilk/shared';
import { testCareLogEntry } from '@/testing/care-log-entry';
import { PULLED_TEST_SAC } from '@/testing/sac-incubation-fields';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { IncubatorEntry } from './incubator-entry';

afterEach(() => vi.unstubAllGlobals());

const sac = PULLED_TEST_SAC;

const entry = (kind: CareLogKind) => testCareLogEntry({ id: 'e1', kind, at: '2026-12-01T09:30:00Z' });

// A loaded machine renders these slowly; nothing here is timed.
describe('IncubatorEntry', { timeout: 30_000 }, () => {
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
    expect(screen.getByRole('button', { name: 'Pulled, into the incubator' })).toBeInTheDocument();
    expect(screen.getByTestId('heat-caution')).toHaveTextContent(/thermostat/);
  });

  it('offers a caretaker no pull the server would refuse', () => {
    vi.stubGlobal('fetch', stubFetch({}).fetchStub);
    const caretakerView = { ...sac.may, edit: false, pullAndOpen: false, setIncubatorRights: false };
    renderWithProviders(
      <IncubatorEntry sac={{ ...sac, pulled: false, pulledAt: null, pulledOn: null, roll: null, may: caretakerView }} timeZone="UTC" temperatureUnit="C" />,
    );
    expect(screen.queryByRole('button', { name: /Pulled/ })).not.toBeInTheDocument();
    expect(screen.getByTestId('pull-not-mine')).toHaveTextContent('The keeper records the pull of this sac.');
  });

  it('says when the legs have formed that rolls are over and readings go on, and flags a reading outside the band', () => {
    vi.stubGlobal('fetch', stubFetch({}).fetchStub);
    const legs = {
      ...sac,
      broodStage: 'eggs-with-legs' as const,
      roll: null,
      readingAlerts: [{ kind: 'temperature' as const, value: 30, at: '2026-12-01T06:00:00Z', side: 'above' as const }],
    };
    renderWithProviders(<IncubatorEntry sac={legs} timeZone="UTC" temperatureUnit="C" />);
    expect(screen.getByTestId('next-roll')).toHaveTextContent('No more rolls: eggs with legs reached; checks and readings go on.');
    // Default band 24–28 °C: docs/trade-facts.md §4 (from memory).
    expect(screen.getByTestId('reading-alert')).toHaveTextContent('Temperature 30.0 °C, above the band (24.0 °C to 28.0 °C)');
    expect(screen.getByRole('button', { name: 'Save readings' })).toBeEnabled();
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
    expect(humidity).toHaveAccessibleDescription(/150 is out of range: give a number from 0 to 100\./);
    await userEvent.click(screen.getByRole('button', { name: 'Save readings' }));
    expect(humidity).toHaveValue('150');
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('asks before recording the pull, warns on a day before the window and sends the earlier time given', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/sacs/s1/pull': () => ({ status: 201, body: { ...sac } }),
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
    await userEvent.click(screen.getByRole('button', { name: 'Pulled, into the incubator' }));
    const dialog = await screen.findByRole('dialog', { name: 'Record the pull' });
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);

    const day22 = addDays(layDate, 22);
    const date = within(dialog).getByLabelText('Pulled on');
    await userEvent.clear(date);
    await userEvent.type(date, day22);
    const time = within(dialog).getByLabelText('At');
    await userEvent.clear(time);
    await userEvent.type(time, '07:15');
    expect(within(dialog).getByTestId('confirm-warning')).toHaveTextContent("That is day 22, before this sac's pull window (days 30–45)");
    await userEvent.click(within(dialog).getByRole('button', { name: 'Record the pull' }));
    await waitFor(() => expect(calls.filter((c) => c.path === '/api/sacs/s1/pull')).toHaveLength(1));
    expect(calls.find((c) => c.path === '/api/sacs/s1/pull')?.body).toEqual({ pulledAt: `${day22}T07:15:00.000Z` });
  });
});
