import { screen, within } from '@testing-library/react';
import { Route, Routes } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ProgressView } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { Component as ProgressPage } from './progress';

afterEach(() => vi.unstubAllGlobals());

/** An invented project as the server answers it for the outside party "Aurelia Outside". */
const view: ProgressView = {
  project: {
    title: 'Spring pair',
    stage: 'in-incubator',
    endedEarlyReason: null,
    setback: null,
    female: { scientificName: 'Grammostola pulchripes' },
    male: { scientificName: 'Grammostola pulchripes' },
  },
  party: { name: 'Aurelia Outside', role: 'partner' },
  timeline: [
    { id: 'e2', kind: 'sac.opened', at: '2025-10-18T09:00:00.000Z' },
    { id: 'e1', kind: 'sac.laid', at: '2025-09-10T08:00:00.000Z' },
  ],
  sacs: [
    {
      id: 's1',
      layDate: '2025-09-10',
      pulledOn: '2025-10-05',
      openedAt: '2025-10-18T09:00:00.000Z',
      outcome: 'in-progress',
      failureReason: null,
      broodStage: 'eggs-with-legs',
      currentCount: 160,
      currentCountEstimated: false,
      photos: [
        {
          id: 'ph1',
          url: '/api/progress/tok/photos/ph1',
          thumbUrl: '/api/progress/tok/photos/ph1/thumb',
          width: 32,
          height: 24,
          createdAt: '2025-10-18T09:05:00.000Z',
        },
      ],
    },
  ],
  share: {
    termsInForce: true,
    failureClause: 'nothing-owed',
    sacs: [{ sacId: 's1', layDate: '2025-09-10', count: 32, failed: false }],
    total: 32,
    handedOver: 0,
    stillOwed: 32,
    provisional: false,
  },
  generatedAt: '2025-10-20T18:00:00.000Z',
};

const renderAt = (answer: { status: number; body: unknown }) => {
  const stub = stubFetch({ 'GET /api/progress/tok': () => answer });
  vi.stubGlobal('fetch', stub.fetchStub);
  renderWithProviders(
    <Routes>
      <Route path="/progress/:token" element={<ProgressPage />} />
    </Routes>,
    { route: '/progress/tok' },
  );
  return stub;
};

describe('the progress page of an outside party', () => {
  it('shows the pair, the stage, the sac with its count and photo, the party’s own share and the timeline in catalogue words, without signing in', async () => {
    const stub = renderAt({ status: 200, body: view });
    expect(await screen.findByRole('heading', { name: 'Spring pair' })).toBeInTheDocument();
    expect(screen.getByText('Stage now: In incubator')).toBeInTheDocument();
    expect(screen.getByText('Female: Grammostola pulchripes')).toBeInTheDocument();
    const sac = screen.getByTestId('progress-sac');
    expect(within(sac).getByText('160 young alive')).toBeInTheDocument();
    expect(within(sac).getByText('Stage: Eggs with legs')).toBeInTheDocument();
    expect(within(sac).getByRole('img')).toHaveAttribute('src', '/api/progress/tok/photos/ph1/thumb');
    const share = screen.getByTestId('progress-share');
    expect(within(share).getByText('Your share: 32 young')).toBeInTheDocument();
    expect(within(share).getByText('Still owed to you: 32')).toBeInTheDocument();
    expect(within(share).getByText('If a sac fails: Nothing is owed if it fails')).toBeInTheDocument();
    // Timeline kinds are named from the catalogue, never shown as codes.
    expect(screen.getByText('Sac opened')).toBeInTheDocument();
    expect(screen.getByText('Sac laid')).toBeInTheDocument();
    expect(screen.queryByText(/sac\.opened|in-incubator|nothing-owed/)).not.toBeInTheDocument();
    expect(stub.calls.map((c) => `${c.method} ${c.path}`)).toEqual(['GET /api/progress/tok']);
  });

  it('a revoked or unknown link says so in words and offers nothing else', async () => {
    renderAt({ status: 404, body: { statusCode: 404, error: 'Not Found', message: 'raw server text' } });
    expect(await screen.findByRole('alert')).toHaveTextContent('This link does not open. The keeper may have sent you a newer one or revoked it');
    expect(screen.queryByTestId('progress-view')).not.toBeInTheDocument();
  });
});
