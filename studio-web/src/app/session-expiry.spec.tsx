import { fireEvent, screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse } from '@/testing/mock-fetch';
import { SHOW, shotPageBody, summaryBody, throughputBody } from './testing/fixtures';
import { calls, meBody, mockApi, NOT_SIGNED_IN } from './testing/mock-api';
import { currentHref, renderApp } from './testing/render-app';

// The whole app with its loaders renders slowly on a busy machine; wait generously.
const SLOW = { timeout: 15_000 };

describe('session expiry', { timeout: 30_000 }, () => {
  it('sends the user to sign-in on a 401 from any request, then back to the page', async () => {
    // The session is alive for the user check, then ends before the page's own requests.
    let signedIn = true;
    const session = (body: unknown) => () => (signedIn ? jsonResponse(body) : NOT_SIGNED_IN());
    const spy = mockApi({
      'GET /api/auth/me': () => {
        const answer = session(meBody('producer'))();
        signedIn = false;
        return answer;
      },
      'GET /api/shows': session([SHOW]),
      'GET /api/shows/show-1/shots/summary': session(summaryBody()),
      'GET /api/shows/show-1/shots/throughput': session(throughputBody([0, 1])),
      'GET /api/shows/show-1/shots': session(shotPageBody([])),
      'GET /api/shows/show-1/members': session([]),
      'POST /api/auth/sign-in': () => {
        signedIn = true;
        return jsonResponse(meBody('producer'));
      },
    });
    const { router } = renderApp('/shows/show-1/tracking?late=true');

    expect(await screen.findByRole('heading', { name: 'Sign in' }, SLOW)).toBeTruthy();
    const back = '/shows/show-1/tracking?late=true';
    expect(currentHref(router)).toBe(`/sign-in?redirectTo=${encodeURIComponent(back)}`);

    fireEvent.change(screen.getByLabelText('E-mail'), {
      target: { value: 'producer@studio.example' },
    });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'a long password' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    // Sign-in, then the whole tracking page with its loaders: slow on a busy machine.
    const heading = await screen.findByRole('heading', { level: 1, name: 'Tracking' }, SLOW);
    expect(heading).toBeTruthy();
    expect(currentHref(router)).toBe(back);
    expect(calls(spy)).toContain('POST /api/auth/sign-in');
  });

  it('keeps a wrong password on the sign-in form instead of treating it as an expired session', async () => {
    mockApi({
      'GET /api/auth/me': NOT_SIGNED_IN,
      'POST /api/auth/sign-in': () =>
        jsonResponse(
          { code: 'INVALID_CREDENTIALS', message: 'The e-mail or password is wrong.' },
          401,
        ),
    });
    const { router } = renderApp('/sign-in?redirectTo=%2Fshows');
    fireEvent.change(await screen.findByLabelText('E-mail', {}, SLOW), {
      target: { value: 'someone@studio.example' },
    });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'wrong' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect((await screen.findByRole('alert', {}, SLOW)).textContent).toContain(
      'The e-mail or password is wrong.',
    );
    expect(currentHref(router)).toBe('/sign-in?redirectTo=%2Fshows');
  });

  it('never follows a redirectTo that leaves the studio', async () => {
    mockApi({
      'GET /api/auth/me': NOT_SIGNED_IN,
      'POST /api/auth/sign-in': () => jsonResponse(meBody('animator')),
      'GET /api/shows': () => jsonResponse([SHOW]),
    });
    const { router } = renderApp(`/sign-in?redirectTo=${encodeURIComponent('//evil.example/x')}`);
    fireEvent.change(await screen.findByLabelText('E-mail', {}, SLOW), {
      target: { value: 'a@studio.example' },
    });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'pw' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/shows'), SLOW);
  });

  it('asks the API nothing about a browser that signed out, and shows sign-in', async () => {
    const spy = mockApi({ 'GET /api/auth/me': NOT_SIGNED_IN });
    const { router } = renderApp('/shows', { signedInBefore: false });
    expect(await screen.findByRole('heading', { name: 'Sign in' }, SLOW)).toBeTruthy();
    expect(currentHref(router)).toBe('/sign-in?redirectTo=%2Fshows');
    expect(calls(spy)).toEqual([]);
  });
});
