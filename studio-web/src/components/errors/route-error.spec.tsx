import { render, screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
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
      { path: '/status', element: <p>status page</p> },
    ]);
    render(<RouterProvider router={router} />);

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('This page could not be shown.');
    expect(alert.textContent).toContain('Take v3 has no frames.');
    expect(screen.getByRole('link', { name: 'Go to Status' }).getAttribute('href')).toBe('/status');
  });
});
