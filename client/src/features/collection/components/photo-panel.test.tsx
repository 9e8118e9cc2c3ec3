import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { PhotoPanel } from './photo-panel';

afterEach(() => vi.unstubAllGlobals());

describe('PhotoPanel', () => {
  it('shows the server’s refusal of a photo', async () => {
    const refusal = 'That file is not a JPEG, PNG, WebP or HEIC image.';
    const { fetchStub } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/animals/a1/photos': () => ({ status: 415, body: { statusCode: 415, error: 'Unsupported Media Type', message: refusal } }),
    });
    // The upload is FormData, which stubFetch would try to read as JSON.
    vi.stubGlobal('fetch', (input: RequestInfo | URL, init?: RequestInit) =>
      fetchStub(input, init?.body instanceof FormData ? { ...init, body: undefined } : init),
    );
    renderWithProviders(<PhotoPanel animalId="a1" photos={[]} editable label="Rosa" />);
    expect(screen.getByText(/up to 15 MB/)).toBeInTheDocument();
    const input = screen.getByTestId('photo-dropzone').querySelector('input[type=file]') as HTMLInputElement;
    await userEvent.upload(input, new File([new Uint8Array([1, 2, 3])], 'fake.png', { type: 'image/png' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(refusal);
  });

  it('shows thumbnails from the API that open the full image', async () => {
    const photos = [{ id: 'p1', url: '/api/photos/p1', thumbUrl: '/api/photos/p1/thumb', width: 800, height: 600, createdAt: '2026-01-01T00:00:00Z' }];
    renderWithProviders(<PhotoPanel animalId="a1" photos={photos} editable={false} label="Rosa" />);
    expect(screen.queryByTestId('photo-dropzone')).not.toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Rosa, photo 1' })).toHaveAttribute('src', '/api/photos/p1/thumb');
    await userEvent.click(screen.getByRole('button', { name: 'Open photo 1 of Rosa' }));
    expect(await screen.findByRole('img', { name: 'Rosa, full size' })).toHaveAttribute('src', '/api/photos/p1');
  });
});
