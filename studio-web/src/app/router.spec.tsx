import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { AppTheme } from '@/components/ui/app-theme';
import { createQueryClient } from '@/lib/query-client';
import { jsonResponse, mockFetch } from '@/testing/mock-fetch';
import { createAppRoutes } from './router';

function renderAt(path: string) {
  const queryClient = createQueryClient();
  const router = createMemoryRouter(createAppRoutes(queryClient), { initialEntries: [path] });
  render(
    <AppTheme>
      <QueryClientProvider client={queryClient}>
        <RouterProvider router={router} />
      </QueryClientProvider>
    </AppTheme>,
  );
  return router;
}

describe('app routes', () => {
  it('sends / to the Status page', async () => {
    mockFetch(() => jsonResponse({ code: 'NOT_READY', message: 'Starting up.' }, 500));
    const router = renderAt('/');
    expect(await screen.findByRole('heading', { level: 1, name: 'Status' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/status');
    // The nav tab repeats its label in a hidden span (kept for layout), hence the loose name.
    const tab = screen.getByRole('link', { name: /^Status/ });
    expect(tab.getAttribute('aria-current')).toBe('page');
  });

  it('shows a plain not-found message for an unknown address, inside the app frame', async () => {
    renderAt('/no/such/page');
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeTruthy();
    screen.getByText('Overshoot');
  });
});
