import '@/testing/setup';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { buildSession } from '@/testing/builders';
import { errorReply, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { SignUpForm } from './sign-up-form';

async function fill(name: string, email: string, password: string) {
  const user = userEvent.setup();
  await user.type(screen.getByLabelText(/^Your name/), name);
  await user.type(screen.getByLabelText(/^E-mail/), email);
  await user.type(screen.getByLabelText(/^Password/), password);
  await user.click(screen.getByRole('button', { name: 'Create account' }));
}

describe('SignUpForm', () => {
  it('ties a too-short password error to the field and sends nothing', async () => {
    const { fetchMock } = mockApi({});
    renderWithProviders(<SignUpForm />, { session: buildSession(null) });
    await fill('Robin Tern', 'robin@harbour.example', 'short');

    const password = screen.getByLabelText(/^Password/);
    await waitFor(() => expect(password).toHaveAttribute('aria-invalid', 'true'));
    const describedBy = password.getAttribute('aria-describedby') ?? '';
    const messages = describedBy.split(' ').map((id) => document.getElementById(id)?.textContent);
    expect(messages).toContain('Use at least 10 characters');
    expect(password).toHaveFocus();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('flags a bad address and a one-letter name on their own fields', async () => {
    mockApi({});
    renderWithProviders(<SignUpForm />, { session: buildSession(null) });
    await fill('R', 'not-an-address', 'long enough password');
    expect(await screen.findByText('Enter a valid e-mail address')).toBeInTheDocument();
    expect(screen.getByLabelText(/^E-mail/)).toHaveAccessibleDescription(
      'Enter a valid e-mail address',
    );
    expect(screen.getByLabelText(/^Your name/)).toHaveAccessibleDescription(
      /Name needs at least 2 characters/,
    );
    expect(screen.getByLabelText(/^Password/)).not.toHaveAttribute('aria-invalid');
  });

  it('asks the person to check their inbox after signing up', async () => {
    const { requests } = mockApi({
      'POST /api/auth/signup': () => ({
        status: 201,
        body: { data: { email: 'robin@harbour.example' } },
      }),
    });
    renderWithProviders(<SignUpForm />, { session: buildSession(null) });
    await fill('Robin Tern', 'robin@harbour.example', 'a long enough password');

    expect(await screen.findByText('Check your inbox')).toBeInTheDocument();
    expect(screen.getByText(/robin@harbour\.example/)).toBeInTheDocument();
    expect(requests[0]?.body).toEqual({
      displayName: 'Robin Tern',
      email: 'robin@harbour.example',
      password: 'a long enough password',
    });
  });

  it('puts a taken address from the server on the e-mail field', async () => {
    mockApi({
      'POST /api/auth/signup': () =>
        errorReply(409, 'CONFLICT', 'Could not sign up', {
          email: 'That address is already registered',
        }),
    });
    renderWithProviders(<SignUpForm />, { session: buildSession(null) });
    await fill('Robin Tern', 'robin@harbour.example', 'a long enough password');
    const email = screen.getByLabelText(/^E-mail/);
    await waitFor(() =>
      expect(email).toHaveAccessibleDescription('That address is already registered'),
    );
    expect(email).toHaveValue('robin@harbour.example');
  });
});
