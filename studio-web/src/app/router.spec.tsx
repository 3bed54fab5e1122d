import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse } from '@/testing/mock-fetch';
import { SHOW } from './testing/fixtures';
import { meBody, mockApi, NOT_SIGNED_IN } from './testing/mock-api';
import { currentHref, renderApp } from './testing/render-app';

// The whole app with its loaders renders slowly on a busy machine; wait generously.
const SLOW = { timeout: 15_000 };

const HEALTH_DOWN = () => jsonResponse({ code: 'NOT_READY', message: 'Starting up.' }, 500);

describe('app routes', { timeout: 30_000 }, () => {
  it('sends / to the public Status page when nobody is signed in', async () => {
    mockApi({ 'GET /api/auth/me': NOT_SIGNED_IN, 'GET /api/health': HEALTH_DOWN });
    const { router } = renderApp('/');
    expect(await screen.findByRole('heading', { level: 1, name: 'Status' }, SLOW)).toBeTruthy();
    expect(router.state.location.pathname).toBe('/status');
    const signIn = await screen.findByRole('link', { name: 'Sign in' }, SLOW);
    expect(signIn.getAttribute('href')).toBe('/sign-in');
  });

  it('sends / to the show picker when someone is signed in', async () => {
    mockApi({
      'GET /api/auth/me': () => jsonResponse(meBody('animator')),
      'GET /api/shows': () => jsonResponse([SHOW]),
    });
    const { router } = renderApp('/');
    expect(await screen.findByRole('heading', { level: 1, name: 'Shows' }, SLOW)).toBeTruthy();
    expect(router.state.location.pathname).toBe('/shows');
    expect(await screen.findByRole('link', { name: 'Harbor Lights' }, SLOW)).toBeTruthy();
  });

  it('sends a signed-out visitor of a show page to sign-in, remembering the page', async () => {
    mockApi({ 'GET /api/auth/me': NOT_SIGNED_IN });
    const { router } = renderApp('/shows/show-1/tracking?late=true');
    expect(await screen.findByRole('heading', { name: 'Sign in' }, SLOW)).toBeTruthy();
    expect(currentHref(router)).toBe(
      `/sign-in?redirectTo=${encodeURIComponent('/shows/show-1/tracking?late=true')}`,
    );
  });

  it('answers a role without the right with a plain refusal, not the page', async () => {
    mockApi({
      'GET /api/auth/me': () => jsonResponse(meBody('animator')),
      'GET /api/shows': () => jsonResponse([SHOW]),
    });
    renderApp('/admin/users');
    const alert = await screen.findByRole('alert', {}, SLOW);
    expect(alert.textContent).toContain('This page is not open to your role.');
    expect(alert.textContent).toContain('Only admins may open the admin screens.');
    expect(screen.queryByRole('heading', { name: 'Users' })).toBeNull();
  });

  it('shows a plain not-found message for an unknown address, inside the app frame', async () => {
    mockApi({ 'GET /api/auth/me': NOT_SIGNED_IN });
    renderApp('/no/such/page');
    expect(await screen.findByRole('heading', { name: 'Page not found' }, SLOW)).toBeTruthy();
    await waitFor(() => screen.getByText('Overshoot'));
  });
});
