import '@/testing/setup';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { StrictMode } from 'react';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { errorReply, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { VerifyEmailStatus } from './verify-email-status';

const TOKEN = 'a'.repeat(32);

describe('VerifyEmailStatus', () => {
  it('posts the token once, even in StrictMode, and confirms', async () => {
    const { requests } = mockApi({
      'POST /api/auth/verify-email': () => ({
        body: { data: { user: buildUser({ displayName: 'Robin Tern' }) } },
      }),
    });
    renderWithProviders(
      <StrictMode>
        <VerifyEmailStatus token={TOKEN} />
      </StrictMode>,
      { session: buildSession(null) },
    );
    expect(await screen.findByText('Your e-mail address is confirmed')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'sign in' })).toHaveAttribute('href', '/sign-in');
    const posts = requests.filter((request) => request.url === '/api/auth/verify-email');
    expect(posts).toHaveLength(1);
    expect(posts[0]?.body).toEqual({ token: TOKEN });
  });

  it('explains a used link and sends a new one on request', async () => {
    const { requests } = mockApi({
      'POST /api/auth/verify-email': () => errorReply(410, 'GONE', 'This link was already used'),
      'POST /api/auth/resend-verification': () => ({ status: 202 }),
    });
    renderWithProviders(<VerifyEmailStatus token={TOKEN} />, { session: buildSession(null) });
    expect(await screen.findByText("This confirmation link doesn't work")).toBeInTheDocument();

    const user = userEvent.setup();
    await user.type(screen.getByLabelText(/^E-mail/), 'robin@harbour.example');
    await user.click(screen.getByRole('button', { name: 'Send a new link' }));
    expect(await screen.findByText(/a new link is on its way/)).toBeInTheDocument();
    expect(requests.at(-1)).toMatchObject({
      url: '/api/auth/resend-verification',
      body: { email: 'robin@harbour.example' },
    });
  });

  it('sends nothing for a link without a token', async () => {
    const { fetchMock } = mockApi({});
    renderWithProviders(<VerifyEmailStatus token="" />, { session: buildSession(null) });
    expect(await screen.findByText(/The link is incomplete/)).toBeInTheDocument();
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
