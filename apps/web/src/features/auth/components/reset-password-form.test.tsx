import '@/testing/setup';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { buildSession } from '@/testing/builders';
import { errorReply, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { ResetPasswordForm } from './reset-password-form';

const TOKEN = 'b'.repeat(40);

async function submit(password: string, repeat: string) {
  const user = userEvent.setup();
  await user.type(screen.getByLabelText(/^New password/), password);
  await user.type(screen.getByLabelText(/^Repeat new password/), repeat);
  await user.click(screen.getByRole('button', { name: 'Save new password' }));
}

describe('ResetPasswordForm', () => {
  it('catches two different passwords on the repeat field without calling the server', async () => {
    const { fetchMock } = mockApi({});
    renderWithProviders(<ResetPasswordForm token={TOKEN} />, { session: buildSession(null) });
    await submit('first long password', 'second long password');
    const repeat = screen.getByLabelText(/^Repeat new password/);
    await waitFor(() =>
      expect(repeat).toHaveAccessibleDescription("The two passwords don't match"),
    );
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('sends token and password, then points to sign-in', async () => {
    const { requests } = mockApi({
      'POST /api/auth/password-reset/confirm': () => ({ body: { data: { ok: true } } }),
    });
    renderWithProviders(<ResetPasswordForm token={TOKEN} />, { session: buildSession(null) });
    await submit('a fresh long password', 'a fresh long password');
    expect(await screen.findByText('Password changed')).toBeInTheDocument();
    expect(requests[0]?.body).toEqual({ token: TOKEN, password: 'a fresh long password' });
  });

  it('explains an expired link (410) and links to a new request', async () => {
    mockApi({
      'POST /api/auth/password-reset/confirm': () => errorReply(410, 'GONE', 'Link expired'),
    });
    renderWithProviders(<ResetPasswordForm token={TOKEN} />, { session: buildSession(null) });
    await submit('a fresh long password', 'a fresh long password');
    expect(await screen.findByText('This reset link no longer works')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Ask for a new link' })).toHaveAttribute(
      'href',
      '/reset-password',
    );
  });
});
