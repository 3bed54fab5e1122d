import { fireEvent, screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockFetch } from '@/testing/mock-fetch';
import { renderWithProviders } from '@/testing/render-with-providers';
import { CreateShowForm } from './create-show-form';
import { TokensPanel } from './tokens-panel';

const TOKEN = {
  id: 'tk1',
  showId: 's1',
  name: 'render farm',
  scopes: ['render:write'],
  hint: 'ovs_ab12',
  createdAt: '2030-01-01T00:00:00.000Z',
  createdBy: 'u1',
  lastUsedAt: null,
  revokedAt: null,
};
const SECRET = 'ovs_ab12-this-is-the-whole-secret-value';

describe('CreateShowForm', () => {
  it('explains a code the API would refuse, and sends nothing', () => {
    const spy = mockFetch(() => jsonResponse({}));
    renderWithProviders(<CreateShowForm />);
    fireEvent.change(screen.getByLabelText('Code'), { target: { value: '-bad code' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create the show' }));
    expect(screen.getByText(/2 to 16 letters, digits, - or _/)).toBeTruthy();
    expect(screen.getByText('Enter a name.')).toBeTruthy();
    expect(spy).not.toHaveBeenCalled();
  });
});

describe('TokensPanel', () => {
  it('wants a name and a scope before creating a token', () => {
    const spy = mockFetch(() => jsonResponse([]));
    renderWithProviders(<TokensPanel showId="s1" />);
    fireEvent.click(screen.getByRole('button', { name: 'Create the token' }));
    expect(screen.getByText('Enter a name.')).toBeTruthy();
    expect(screen.getByText('Choose at least one scope.')).toBeTruthy();
    expect(spy.mock.calls.every(([, init]) => (init?.method ?? 'GET') === 'GET')).toBe(true);
  });

  it('shows a new token’s secret once, with a warning, and drops it when dismissed', async () => {
    let created = false;
    mockFetch((url, init) => {
      if (init.method === 'POST') {
        created = true;
        return jsonResponse({ ...TOKEN, secret: SECRET }, 201);
      }
      return jsonResponse(created ? [TOKEN] : []);
    });
    renderWithProviders(<TokensPanel showId="s1" />);
    fireEvent.change(screen.getByLabelText('Token name'), { target: { value: 'render farm' } });
    fireEvent.click(screen.getByRole('checkbox', { name: 'Report render state' }));
    fireEvent.click(screen.getByRole('button', { name: 'Create the token' }));

    const secret = await screen.findByTestId('token-secret-value');
    expect(secret.textContent).toBe(SECRET);
    expect(screen.getByTestId('token-secret').textContent).toContain('shown this once');
    await screen.findByTestId('tokens-table');

    fireEvent.click(screen.getByRole('button', { name: 'I have stored it' }));
    await waitFor(() => expect(screen.queryByTestId('token-secret')).toBeNull());
    expect(document.body.textContent).not.toContain(SECRET);
    // The list shows only the secret's first characters.
    expect(screen.getByText('ovs_ab12…')).toBeTruthy();
  });
});
