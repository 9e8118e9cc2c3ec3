import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { CsvTools } from './csv-import';

afterEach(() => vi.unstubAllGlobals());

/** stubFetch reads JSON bodies; the upload is FormData, so it is kept aside here. */
function stubUpload(routes: Parameters<typeof stubFetch>[0]) {
  const { fetchStub, calls } = stubFetch(routes);
  const uploads: File[] = [];
  vi.stubGlobal('fetch', (input: RequestInfo | URL, init?: RequestInit) => {
    if (init?.body instanceof FormData) {
      uploads.push(init.body.get('file') as File);
      return fetchStub(input, { ...init, body: undefined });
    }
    return fetchStub(input, init);
  });
  return { calls, uploads };
}

function csvFile(text: string) {
  return new File([text], 'animals.csv', { type: 'text/csv' });
}

describe('CSV import', () => {
  it('lists every refused row with its line number and reason', async () => {
    const { uploads } = stubUpload({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/animals/import': () => ({
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Nothing was imported: 2 lines have problems. Correct them and import the file again.',
          details: [
            { field: 'line 7', message: 'species: "Brachypelma nonsense" is not a name in the catalogue.' },
            { field: 'line 3', message: 'A mature male needs the date of his maturing molt: his male clock counts from it.' },
            { field: 'line 7', message: 'sex must be one of: female, male, unsexed.' },
          ],
        },
      }),
    });
    const { container } = renderWithProviders(<CsvTools />);
    await userEvent.upload(container.querySelector('input[type=file]') as HTMLInputElement, csvFile('label,species\nA,B\n'));
    const list = await screen.findByRole('list', { name: 'Rows with problems' });
    const items = within(list)
      .getAllByRole('listitem')
      .map((li) => li.textContent);
    expect(items).toEqual([
      'Line 3: A mature male needs the date of his maturing molt: his male clock counts from it.',
      'Line 7: species: "Brachypelma nonsense" is not a name in the catalogue.',
      'Line 7: sex must be one of: female, male, unsexed.',
    ]);
    expect(screen.getByText(/Nothing was imported: 2 lines have problems/)).toBeInTheDocument();
    expect(uploads.map((f) => f.name)).toEqual(['animals.csv']);
  });

  it('says how many animals were imported', async () => {
    stubUpload({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/animals/import': () => ({ status: 201, body: { imported: 12 } }),
    });
    const { container } = renderWithProviders(<CsvTools />);
    await userEvent.upload(container.querySelector('input[type=file]') as HTMLInputElement, csvFile('label\nA\n'));
    await waitFor(() => expect(screen.getByText('12 animals were imported.')).toBeInTheDocument());
    expect(screen.queryByRole('list', { name: 'Rows with problems' })).not.toBeInTheDocument();
  });
});
