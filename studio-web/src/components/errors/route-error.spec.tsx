import { render, screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { RouteError } from './route-error';

function Broken(): never {
  throw new Error('Take v3 has no frames.');
}

describe('RouteError', () => {
  it('replaces a page that throws with a plain message and a way back', async () => {
    // React reports the caught render error on the console; keep the test output readable.
    vi.spyOn(console, 'error').mockImplementation(() => {});
    const router = createMemoryRouter([
      { path: '/', element: <Broken />, errorElement: <RouteError /> },
    ]);
    render(<RouterProvider router={router} />);

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('This page could not be shown.');
    expect(alert.textContent).toContain('Take v3 has no frames.');
    expect(screen.getByRole('link', { name: 'Go to the start page' }).getAttribute('href')).toBe(
      '/',
    );
  });

  it('turns a loader’s 401 into sign-in that returns to the page', async () => {
    // The router reports the loader's error before the boundary handles it.
    vi.spyOn(console, 'error').mockImplementation(() => {});
    vi.spyOn(console, 'warn').mockImplementation(() => {});
    const router = createMemoryRouter(
      [
        {
          path: '/shows/:showId/shots',
          loader: () => {
            throw new ApiError({ status: 401, code: 'NOT_SIGNED_IN', message: 'Sign in first.' });
          },
          element: <p>shots</p>,
          errorElement: <RouteError />,
        },
        { path: '/sign-in', element: <p>sign-in page</p> },
      ],
      { initialEntries: ['/shows/s1/shots?page=2'] },
    );
    render(<RouterProvider router={router} />);
    await screen.findByText('sign-in page');
    expect(router.state.location.search).toBe(
      `?redirectTo=${encodeURIComponent('/shows/s1/shots?page=2')}`,
    );
  });
});
