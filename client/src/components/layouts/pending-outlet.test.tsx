import { MantineProvider } from '@mantine/core';
import { act, render, screen } from '@testing-library/react';
import { createMemoryRouter, Link, RouterProvider } from 'react-router';
import { describe, expect, it } from 'vitest';
import userEvent from '@testing-library/user-event';
import { theme } from '@/config/theme';
import { PendingOutlet } from './pending-outlet';

function setup() {
  let release!: () => void;
  const slowData = new Promise<null>((resolve) => (release = () => resolve(null)));
  const router = createMemoryRouter([
    {
      path: '/',
      element: <PendingOutlet />,
      children: [
        { index: true, element: <Link to="/slow?tab=1">Go to the slow page</Link> },
        {
          path: 'slow',
          // The second tab never finishes loading, so the test sees the router mid-navigation.
          loader: ({ request }) => (new URL(request.url).searchParams.get('tab') === '2' ? new Promise<null>(() => {}) : slowData),
          element: <h1>Slow page</h1>,
        },
      ],
    },
  ]);
  render(
    <MantineProvider theme={theme}>
      <RouterProvider router={router} />
    </MantineProvider>,
  );
  return { release: () => act(release), router };
}

describe('PendingOutlet', () => {
  it('shows the skeleton while another page loads, then the page', async () => {
    const { release } = setup();
    await userEvent.click(screen.getByRole('link', { name: 'Go to the slow page' }));
    expect(screen.getByTestId('page-skeleton')).toHaveAttribute('aria-busy', 'true');
    expect(screen.getByRole('status')).toHaveTextContent('Loading the page');
    expect(screen.queryByRole('link')).not.toBeInTheDocument();
    release();
    expect(await screen.findByRole('heading', { name: 'Slow page' })).toBeInTheDocument();
    expect(screen.queryByTestId('page-skeleton')).not.toBeInTheDocument();
  });

  it('keeps the page on screen while only its search changes', async () => {
    const { release, router } = setup();
    await userEvent.click(screen.getByRole('link', { name: 'Go to the slow page' }));
    release();
    await screen.findByRole('heading', { name: 'Slow page' });
    act(() => void router.navigate('/slow?tab=2'));
    expect(router.state.navigation.state).toBe('loading');
    expect(screen.getByRole('heading', { name: 'Slow page' })).toBeInTheDocument();
    expect(screen.queryByTestId('page-skeleton')).not.toBeInTheDocument();
  });
});
