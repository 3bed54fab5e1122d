import { fireEvent, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockFetch } from '@/testing/mock-fetch';
import { renderWithProviders } from '@/testing/render-with-providers';
import { AcceptInvitationForm } from './accept-invitation-form';

const INVITATION = {
  id: 'i1',
  email: 'new@studio.example',
  role: 'supervisor' as const,
  shows: [{ id: 's1', code: 'HARBOR', name: 'Harbor Lights' }],
  createdAt: '2030-01-01T00:00:00.000Z',
  expiresAt: '2030-01-08T00:00:00.000Z',
};

function renderForm() {
  const spy = mockFetch(() => jsonResponse({}));
  renderWithProviders(
    <AcceptInvitationForm token={'t'.repeat(30)} invitation={INVITATION} onAccepted={() => {}} />,
  );
  return spy;
}

describe('AcceptInvitationForm', () => {
  it('shows what the invitation offers', () => {
    renderForm();
    expect(screen.getByText('new@studio.example')).toBeTruthy();
    expect(screen.getByText('Supervisor')).toBeTruthy();
    expect(screen.getByText('HARBOR')).toBeTruthy();
  });

  it('asks for a name, a long enough password and the same password twice', () => {
    const spy = renderForm();
    fireEvent.change(screen.getByLabelText('New password'), { target: { value: 'short' } });
    fireEvent.change(screen.getByLabelText('Repeat the password'), { target: { value: 'other' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create my account' }));
    expect(screen.getByText('Enter your name.')).toBeTruthy();
    expect(screen.getByText('Choose a password of at least 12 characters.')).toBeTruthy();
    expect(screen.getByText('The two passwords differ.')).toBeTruthy();
    expect(spy).not.toHaveBeenCalled();
  });
});
