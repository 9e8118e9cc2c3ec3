import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { addDays, todayIn, wordsFor, type ProjectAnimal } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { OpeningPanel } from './opening-panel';
import { sacHasUrticatingHairs } from '../utils/sac-view';

afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

describe('OpeningPanel', { timeout: 30_000 }, () => {
  it('asks once before recording the opening and sends the earlier day and time given', async () => {
    vi.spyOn(navigator, 'language', 'get').mockReturnValue('en-GB');
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'GET /api/sacs/s1/opening': () => ({ status: 200, body: null }),
      'POST /api/sacs/s1/opening': () => ({ status: 201, body: null }),
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<OpeningPanel sac={{ id: 's1', opened: false }} timeZone="UTC" canEdit />);
    const healthy = await screen.findByLabelText('Healthy eggs');
    await userEvent.clear(healthy);
    await userEvent.type(healthy, '120');
    await userEvent.click(screen.getByRole('button', { name: 'Save opening' }));
    const dialog = await screen.findByRole('dialog', { name: 'Record the opening' });
    expect(dialog).toHaveTextContent('this records 120 viable of 120');
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);

    const yesterday = addDays(todayIn('UTC', new Date()), -1);
    const date = within(dialog).getByLabelText('Opened on');
    await userEvent.clear(date);
    await userEvent.type(date, yesterday);
    const time = within(dialog).getByLabelText('At');
    await userEvent.clear(time);
    await userEvent.type(time, '06:30');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Record the opening' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'POST')?.body).toMatchObject({ healthyEggs: 120, keptBack: 0, openedAt: `${yesterday}T06:30:00.000Z` });
  });

  it('refuses a count over the limit with a message, keeping what was typed', async () => {
    const { fetchStub, calls } = stubFetch({ 'GET /api/sacs/s1/opening': () => ({ status: 200, body: null }) });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<OpeningPanel sac={{ id: 's1', opened: false }} timeZone="UTC" canEdit />);
    const nymphs = await screen.findByLabelText('1st instar');
    await userEvent.clear(nymphs);
    await userEvent.type(nymphs, '-4');
    await userEvent.click(screen.getByRole('button', { name: 'Save opening' }));
    await waitFor(() => expect(nymphs).toHaveAccessibleDescription(/A whole number from 0 to/));
    expect(nymphs).toHaveValue('-4');
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  // docs/trade-facts.md check value 8: outside the species' eggs per sac is a warning, never a refusal.
  it('sends an estimate, and on the species-range warning saves it with the reason given', async () => {
    let posts = 0;
    const warning = 'About 2400 eggs and young is more than this species usually lays (100–300 a sac). Check the count, or save it with a reason.';
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'GET /api/sacs/s1/opening': () => ({ status: 200, body: null }),
      'POST /api/sacs/s1/opening': () =>
        (posts += 1) === 1
          ? {
              status: 422,
              body: {
                statusCode: 422,
                error: 'Unprocessable Entity',
                message: warning,
                details: [{ field: 'acknowledgedWarnings', code: 'eggs-outside-species-range', message: warning }],
              },
            }
          : { status: 201, body: null },
    });
    vi.stubGlobal('fetch', fetchStub);
    renderWithProviders(<OpeningPanel sac={{ id: 's1', opened: false }} timeZone="UTC" canEdit />);
    const healthy = await screen.findByLabelText('Healthy eggs');
    await userEvent.clear(healthy);
    await userEvent.type(healthy, '2400');
    await userEvent.click(screen.getByLabelText('These numbers are estimates, not counted one by one'));
    await userEvent.click(screen.getByRole('button', { name: 'Save opening' }));
    const dialog = await screen.findByRole('dialog', { name: 'Record the opening' });
    expect(dialog).toHaveTextContent('this records about 2400 viable of about 2400');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Record the opening' }));
    const check = await screen.findByTestId('warning-confirm');
    expect(check).toHaveTextContent(warning);
    await userEvent.type(within(check).getByLabelText('Why is it right?'), 'Counted a quarter and multiplied');
    await userEvent.click(within(check).getByRole('button', { name: 'Save anyway' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(2));
    expect(calls.filter((c) => c.method === 'POST')[1]?.body).toMatchObject({
      healthyEggs: 2400,
      estimated: true,
      acknowledgedWarnings: ['eggs-outside-species-range'],
      warningReason: 'Counted a quarter and multiplied',
    });
  });
});

// The caution where the hands are (docs/product.md, cautions): urticating hairs are a species fact
// (server/src/species/data/species.data.ts: New World theraphosines flick them, from memory; Old World ones have none).
describe('OpeningPanel: the caution at the opening follows the species', { timeout: 30_000 }, () => {
  const t = wordsFor('en');
  const stubEmptyOpening = () => vi.stubGlobal('fetch', stubFetch({ 'GET /api/sacs/s1/opening': () => ({ status: 200, body: null }) }).fetchStub);

  it('asks for gloves and eye protection when the species has urticating hairs', async () => {
    stubEmptyOpening();
    renderWithProviders(<OpeningPanel sac={{ id: 's1', opened: false }} timeZone="UTC" canEdit urticatingHairs />);
    const note = await screen.findByTestId('safety-openingHairs');
    expect(note).toHaveTextContent(t('safety.openingHairs'));
    expect(note).toHaveTextContent('wear gloves and eye protection: this species has urticating hairs');
    expect(screen.queryByTestId('safety-opening')).not.toBeInTheDocument();
  });

  it('gives the general caution, naming both cases, when the species is not known', async () => {
    stubEmptyOpening();
    renderWithProviders(<OpeningPanel sac={{ id: 's1', opened: false }} timeZone="UTC" canEdit />);
    const note = await screen.findByTestId('safety-opening');
    expect(note).toHaveTextContent('For species with urticating hairs wear gloves and eye protection');
    expect(screen.queryByTestId('safety-openingHairs')).not.toBeInTheDocument();
  });

  it('leaves out the hair advice for a species known to have none, and keeps the tools and the law', async () => {
    stubEmptyOpening();
    renderWithProviders(<OpeningPanel sac={{ id: 's1', opened: false }} timeZone="UTC" canEdit urticatingHairs={false} />);
    const note = await screen.findByTestId('safety-openingNoHairs');
    expect(note).not.toHaveTextContent(/urticating/);
    expect(note).toHaveTextContent('never bare hands');
    expect(note).toHaveTextContent('Follow local law and licensed practice.');
  });

  it('reads the hairs from the pair: either parent with them counts, an unknown project is unknown', () => {
    const animal = (urticatingHairs: boolean) => ({ species: { urticatingHairs } }) as ProjectAnimal;
    expect(sacHasUrticatingHairs(undefined)).toBeNull();
    expect(sacHasUrticatingHairs({ femaleAnimal: animal(true), maleAnimal: animal(true) })).toBe(true);
    expect(sacHasUrticatingHairs({ femaleAnimal: animal(false), maleAnimal: animal(true) })).toBe(true);
    expect(sacHasUrticatingHairs({ femaleAnimal: animal(false), maleAnimal: animal(false) })).toBe(false);
  });
});
