import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { PULLED_TEST_SAC } from '@/testing/sac-incubation-fields';
import { IncubatorList } from './incubator-list';

afterEach(() => vi.unstubAllGlobals());

describe('IncubatorList', () => {
  it('keeps every sac in the incubator, rolled or not, and leaves out sacs with the mother', async () => {
    const legs = { ...PULLED_TEST_SAC, id: 's2', broodStage: 'eggs-with-legs' as const, roll: null, container: 'Incubator B' };
    const withMother = { ...PULLED_TEST_SAC, id: 's3', pulled: false, pulledAt: null, pulledOn: null, roll: null, inIncubator: false };
    vi.stubGlobal('fetch', stubFetch({ 'GET /api/projects/p1/sacs': () => ({ status: 200, body: [legs, withMother, PULLED_TEST_SAC] }) }).fetchStub);
    renderWithProviders(
      <IncubatorList projects={[{ id: 'p1', title: 'Hamorii pair' }]} timeZone="UTC" temperatureUnit="C" hrefFor={(id) => `/incubator/${id}`} />,
    );
    const links = await screen.findAllByRole('link');
    // The overdue roll first, then the sac whose rolling has stopped; the sac with the mother is not in an incubator.
    expect(links.map((l) => l.getAttribute('href'))).toEqual(['/incubator/s1', '/incubator/s2']);
    expect(links[1]).toHaveTextContent('Eggs with legs · Incubator B');
    expect(links[1]).toHaveTextContent('No rolls now; checks and readings go on.');
  });
});
