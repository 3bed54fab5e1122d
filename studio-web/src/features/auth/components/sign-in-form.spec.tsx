import { fireEvent, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { jsonResponse, mockFetch } from '@/testing/mock-fetch';
import { renderWithProviders } from '@/testing/render-with-providers';
import { SignInForm } from './sign-in-form';

const USER = {
  kind: 'user',
  user: {
    id: 'u1',
    email: 'robin@studio.example',
    displayName: 'Robin Vale',
    role: 'producer',
    disabled: false,
    createdAt: '2030-01-01T00:00:00.000Z',
  },
};

describe('SignInForm', () => {
  it('names each missing field and sends nothing', () => {
    const spy = mockFetch(() => jsonResponse(USER));
    renderWithProviders(<SignInForm onSignedIn={() => {}} />);
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(screen.getByText('Enter an e-mail address.')).toBeTruthy();
    expect(screen.getByText('Enter your password.')).toBeTruthy();
    expect(screen.getByLabelText('E-mail').getAttribute('aria-invalid')).toBe('true');
    expect(spy).not.toHaveBeenCalled();
  });

  it('refuses an address without an @ before asking the API', () => {
    const spy = mockFetch(() => jsonResponse(USER));
    renderWithProviders(<SignInForm onSignedIn={() => {}} />);
    fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: 'robin' } });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'x' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(screen.getByText(/such as name@studio.example/)).toBeTruthy();
    expect(spy).not.toHaveBeenCalled();
  });

  it('sends the trimmed address and reports the signed-in user', async () => {
    const spy = mockFetch(() => jsonResponse(USER));
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    fireEvent.change(screen.getByLabelText('E-mail'), {
      target: { value: '  robin@studio.example ' },
    });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: ' secret words ' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await vi.waitFor(() => expect(onSignedIn).toHaveBeenCalled());
    expect(onSignedIn.mock.calls[0][0]).toMatchObject({
      role: 'producer',
      displayName: 'Robin Vale',
    });
    const [url, init] = spy.mock.calls[0];
    expect(url).toBe('/api/auth/sign-in');
    // Passwords are sent as typed: spaces can be part of them.
    expect(JSON.parse(String(init?.body))).toEqual({
      email: 'robin@studio.example',
      password: ' secret words ',
    });
  });
});
