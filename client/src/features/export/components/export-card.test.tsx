import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { ExportCard, formatBytes } from './export-card';

/** A zip-like body sent in pieces, the next piece only when the test says so. */
function streamedResponse(pieces: number[]) {
  const releases: (() => void)[] = [];
  const body = new ReadableStream<Uint8Array>({
    async start(controller) {
      for (const n of pieces) {
        await new Promise<void>((resolve) => releases.push(resolve));
        controller.enqueue(new Uint8Array(n));
      }
      controller.close();
    },
  });
  const response = new Response(body, {
    status: 200,
    headers: { 'content-type': 'application/zip', 'content-disposition': 'attachment; filename="broodsilk-export-2026-12-02.zip"' },
  });
  return { response, next: () => releases.shift()?.() };
}

afterEach(() => vi.unstubAllGlobals());

describe('ExportCard', () => {
  it('shows the bytes received while the archive streams in, then saves it under the server’s name', async () => {
    const { response, next } = streamedResponse([1500, 2_500_000]);
    const fetchStub = vi.fn(async () => response);
    vi.stubGlobal('fetch', fetchStub);
    const saved: string[] = [];
    URL.createObjectURL = vi.fn(() => 'blob:export');
    URL.revokeObjectURL = vi.fn();
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      saved.push(this.download);
    });
    renderWithProviders(<ExportCard />);

    await userEvent.click(screen.getByRole('button', { name: 'Download my data' }));
    expect(fetchStub).toHaveBeenCalledWith('/api/export', expect.objectContaining({ credentials: 'same-origin' }));
    expect(screen.getByRole('progressbar', { name: 'Preparing your data' })).toBeInTheDocument();
    next();
    expect(await screen.findByText('1.5 KB received')).toBeInTheDocument();
    next();
    expect(await screen.findByText('Saved broodsilk-export-2026-12-02.zip (2.5 MB).')).toBeInTheDocument();
    expect(saved).toEqual(['broodsilk-export-2026-12-02.zip']);
    expect(screen.queryByRole('progressbar')).not.toBeInTheDocument();
  });

  it('shows the server’s refusal in words (the hourly limit)', async () => {
    const refusal = {
      statusCode: 429,
      error: 'Too Many Requests',
      message: 'You have reached the limit of 6 data exports per 60 minutes. Try again in 12 minutes.',
    };
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response(JSON.stringify(refusal), { status: 429, headers: { 'content-type': 'application/json' } })),
    );
    renderWithProviders(<ExportCard />);
    await userEvent.click(screen.getByRole('button', { name: 'Download my data' }));
    expect(await screen.findByText(refusal.message)).toBeInTheDocument();
    await waitFor(() => expect(screen.getByRole('button', { name: 'Download my data' })).toBeEnabled());
  });

  it('counts sizes in decimal units (IEC 80000-13: 1 KB here is 1000 bytes)', () => {
    expect(formatBytes(999)).toBe('999 bytes');
    expect(formatBytes(1000)).toBe('1 KB');
    expect(formatBytes(2_500_000)).toBe('2.5 MB');
  });
});
