import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { DeleteAnimal } from './delete-animal';

afterEach(() => vi.unstubAllGlobals());

describe('DeleteAnimal', () => {
  it('explains marking instead of deleting, and shows the reason of a 409', async () => {
    const reason = 'This animal cannot be deleted: it has 2 pairings. Mark it sold or deceased instead.';
    const { fetchStub } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'DELETE /api/animals/a1': () => ({ status: 409, body: { statusCode: 409, error: 'Conflict', message: reason } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onDeleted = vi.fn();
    renderWithProviders(<DeleteAnimal animalId="a1" label="Rosa" onDeleted={onDeleted} />);
    await userEvent.click(screen.getByRole('button', { name: 'Delete' }));
    expect(await screen.findByText(/edit\s+the status instead/)).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Delete for good' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(reason);
    expect(onDeleted).not.toHaveBeenCalled();
  });

  it('reports a deletion the server accepted', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'DELETE /api/animals/a2': () => ({ status: 204 }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onDeleted = vi.fn();
    renderWithProviders(<DeleteAnimal animalId="a2" label="Kiwi" onDeleted={onDeleted} />);
    await userEvent.click(screen.getByRole('button', { name: 'Delete' }));
    await userEvent.click(await screen.findByRole('button', { name: 'Delete for good' }));
    await waitFor(() => expect(onDeleted).toHaveBeenCalled());
    expect(calls.some((c) => c.method === 'DELETE' && c.path === '/api/animals/a2')).toBe(true);
  });
});
