import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { SpeciesPicker } from './species-picker';
import { speciesResponse } from './species-fixtures.test-data';

afterEach(() => vi.unstubAllGlobals());

// The dropdown stays display:none in jsdom (its transition never runs), so options are queried with hidden: true.

const vagans = speciesResponse({ id: 'sp-vagans', scientificName: 'Tliltocatl vagans', formerNames: ['Brachypelma vagans'] });
const albo = speciesResponse({ id: 'sp-albo', scientificName: 'Brachypelma albopilosum', formerNames: [] });

describe('SpeciesPicker', () => {
  it('says "formerly …" for a hit through a former name, and not for a current-name hit', async () => {
    const searches: string[] = [];
    const { fetchStub } = stubFetch({ 'GET /api/species': () => ({ status: 200, body: { items: [albo, vagans], total: 2 } }) });
    vi.stubGlobal('fetch', (input: RequestInfo | URL, init?: RequestInit) => {
      searches.push(new URL(String(input), 'http://localhost').searchParams.get('q') ?? '');
      return fetchStub(input, init);
    });
    const onChange = vi.fn();
    renderWithProviders(<SpeciesPicker onChange={onChange} />);
    await userEvent.type(screen.getByPlaceholderText('Type a current or former name'), 'Brachypelma');
    const option = await screen.findByRole('option', { name: /Tliltocatl vagans/, hidden: true });
    expect(option).toHaveTextContent('formerly Brachypelma vagans');
    expect(screen.getByRole('option', { name: /Brachypelma albopilosum/, hidden: true })).not.toHaveTextContent('formerly');
    expect(searches).toContain('Brachypelma');
    await userEvent.click(option);
    await waitFor(() => expect(onChange).toHaveBeenCalledWith('sp-vagans'));
  });
});
