import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { MoltTimeline } from './molt-timeline';

afterEach(() => vi.unstubAllGlobals());

describe('MoltTimeline', () => {
  it('names the maturing molt entered with the animal instead of saying there is no molt', async () => {
    vi.stubGlobal('fetch', stubFetch({ 'GET /api/animals/a1/molts': () => ({ status: 200, body: [] }) }).fetchStub);
    renderWithProviders(<MoltTimeline animalId="a1" sex="male" editable={false} maturedOn="2026-03-14" />);
    expect(await screen.findByTestId('no-molts')).toHaveTextContent('Maturing molt on 14 Mar 2026, entered with the animal; no other molt recorded.');
  });

  it('says no molt is recorded when there is none', async () => {
    vi.stubGlobal('fetch', stubFetch({ 'GET /api/animals/a2/molts': () => ({ status: 200, body: [] }) }).fetchStub);
    renderWithProviders(<MoltTimeline animalId="a2" sex="female" editable={false} />);
    expect(await screen.findByTestId('no-molts')).toHaveTextContent('No molts recorded yet.');
  });
});
