import '@/testing/setup';
import { fireEvent, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { errorReply, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { DigestSetting } from './digest-setting';

describe('DigestSetting', () => {
  it('opts in with one tick and says so; the request carries only the digest flag', async () => {
    const member = buildUser({ email: 'tern@harbour.example' });
    const { requests } = mockApi({
      'PATCH /api/account': () => ({
        body: { data: { user: { ...member, notificationDigest: true } } },
      }),
    });
    renderWithProviders(<DigestSetting user={member} />, { session: buildSession(member) });
    const box = screen.getByRole('checkbox', { name: /daily digest of unread notices/ });
    expect(box).not.toBeChecked();
    expect(screen.getByText(/tern@harbour\.example/)).toBeInTheDocument();
    await userEvent.setup().click(box);
    expect(requests.at(-1)).toMatchObject({
      url: '/api/account',
      method: 'PATCH',
      body: { notificationDigest: true },
    });
  });

  it('shows the tick the moment the box is clicked, while the request runs', () => {
    const member = buildUser();
    mockApi({
      'PATCH /api/account': () => ({
        body: { data: { user: { ...member, notificationDigest: true } } },
      }),
    });
    renderWithProviders(<DigestSetting user={member} />, { session: buildSession(member) });
    const box = screen.getByRole('checkbox', { name: /daily digest/ });
    fireEvent.click(box);
    // No await: a box that waits for the mutation's pending state springs back unticked here.
    expect(box).toBeChecked();
  });

  it('shows the server’s refusal and leaves the box as it was', async () => {
    const member = buildUser({ notificationDigest: true });
    mockApi({
      'PATCH /api/account': () => errorReply(503, 'UNAVAILABLE', 'The club server is busy'),
    });
    renderWithProviders(<DigestSetting user={member} />, { session: buildSession(member) });
    const box = screen.getByRole('checkbox', { name: /daily digest/ });
    await userEvent.setup().click(box);
    expect(await screen.findByText('The club server is busy')).toBeInTheDocument();
    expect(box).toBeChecked();
  });
});
