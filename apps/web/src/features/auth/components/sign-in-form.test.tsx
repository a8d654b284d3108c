import '@/testing/setup';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { errorReply, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { SignInForm } from './sign-in-form';

const visitor = buildSession(null);

async function fillAndSubmit(email: string, password: string) {
  const user = userEvent.setup();
  await user.type(screen.getByLabelText(/^E-mail/), email);
  await user.type(screen.getByLabelText(/^Password/), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
  return user;
}

describe('SignInForm', () => {
  it('shows server field errors on the field they name and keeps what was typed', async () => {
    mockApi({
      'POST /api/auth/login': () =>
        errorReply(400, 'VALIDATION_FAILED', 'Check the form', {
          password: 'Password is too long',
        }),
    });
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />, { session: visitor });
    await fillAndSubmit('skipper@harbour.example', 'long-enough-secret');

    const password = screen.getByLabelText(/^Password/);
    await waitFor(() => expect(password).toHaveAttribute('aria-invalid', 'true'));
    expect(password).toHaveAccessibleDescription('Password is too long');
    expect(screen.getByLabelText(/^E-mail/)).not.toHaveAttribute('aria-invalid');
    expect(screen.getByLabelText(/^E-mail/)).toHaveValue('skipper@harbour.example');
    expect(password).toHaveValue('long-enough-secret');
  });

  it('sends the trimmed, lower-cased address and reports the new session', async () => {
    const session = buildSession(buildUser({ displayName: 'Kim' }), 'new-token');
    const { requests } = mockApi({ 'POST /api/auth/login': () => ({ body: { data: session } }) });
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />, { session: visitor });
    await fillAndSubmit('  Skipper@Harbour.example ', 'correct horse');

    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(session));
    expect(requests[0]?.body).toEqual({
      email: 'skipper@harbour.example',
      password: 'correct horse',
    });
    expect(requests[0]?.headers['x-csrf-token']).toBe(visitor.csrfToken);
  });

  it('shows a wrong password as a form error', async () => {
    mockApi({
      'POST /api/auth/login': () =>
        errorReply(401, 'UNAUTHENTICATED', 'E-mail or password is wrong'),
    });
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />, { session: visitor });
    await fillAndSubmit('skipper@harbour.example', 'nope');
    expect(await screen.findByRole('alert')).toHaveTextContent('E-mail or password is wrong');
  });

  it('offers a new confirmation link when the address is not verified', async () => {
    const { requests } = mockApi({
      'POST /api/auth/login': () =>
        errorReply(403, 'EMAIL_NOT_VERIFIED', 'Confirm your e-mail first'),
      'POST /api/auth/resend-verification': () => ({ status: 202 }),
    });
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />, { session: visitor });
    const user = await fillAndSubmit('new@harbour.example', 'whatever-it-is');

    await user.click(await screen.findByRole('button', { name: 'Send a new link' }));
    expect(await screen.findByText('A new link is on its way.')).toBeInTheDocument();
    expect(requests.at(-1)).toMatchObject({
      method: 'POST',
      url: '/api/auth/resend-verification',
      body: { email: 'new@harbour.example' },
    });
  });

  it('shows the rate-limit message', async () => {
    mockApi({
      'POST /api/auth/login': () =>
        errorReply(429, 'RATE_LIMITED', 'Too many attempts. Try again in 10 minutes.'),
    });
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />, { session: visitor });
    await fillAndSubmit('skipper@harbour.example', 'again');
    expect(await screen.findByRole('alert')).toHaveTextContent('Try again in 10 minutes.');
  });
});
