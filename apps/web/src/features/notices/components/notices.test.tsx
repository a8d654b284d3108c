import '@/testing/setup';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { NotificationDto } from '@app/shared';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { errorReply, mockApi } from '@/testing/mock-api';
import { renderApp, renderWithProviders } from '@/testing/render';
import { NoticeList } from './notice-list';

const notice = (over: Partial<NotificationDto> = {}): NotificationDto => ({
  id: 1,
  kind: 'reply',
  message: 'New comment on “Chafe at the bow roller”',
  link: '/knowledge/7',
  readAt: null,
  createdAt: '2026-11-30T08:00:00.000Z',
  ...over,
});

describe('Notices page', () => {
  it('lists notices with the unread ones marked in words, and marks all read on request', async () => {
    const member = buildUser();
    let rows = [
      notice({
        id: 2,
        message: 'The asker says your answer on “Snubber length” worked',
        kind: 'accepted',
      }),
      notice({ id: 1, readAt: '2026-11-30T09:00:00.000Z' }),
    ];
    const { requests } = mockApi({
      'GET /api/notifications': () => ({ body: { data: rows } }),
      'GET /api/notifications/unread': () => ({
        body: { data: { unread: rows.filter((r) => !r.readAt).length } },
      }),
      'POST /api/notifications/read': () => {
        rows = rows.map((r) => ({ ...r, readAt: r.readAt ?? '2026-12-01T00:00:00.000Z' }));
        return { status: 204 };
      },
    });
    renderApp({ route: '/notices', session: buildSession(member) });
    expect(await screen.findByRole('heading', { level: 1, name: 'Notices' })).toBeInTheDocument();
    const accepted = await screen.findByRole('link', { name: /Snubber length/ });
    const row = accepted.closest('li');
    expect(row).not.toBeNull();
    expect(within(row as HTMLElement).getByText('New')).toBeInTheDocument();
    expect(within(row as HTMLElement).getByText('Your answer worked')).toBeInTheDocument();
    expect(accepted).toHaveAttribute('href', '/knowledge/7');
    expect(screen.getByRole('link', { name: /Notices, 1 unread/ })).toBeInTheDocument();

    await userEvent.setup().click(screen.getByRole('button', { name: 'Mark all 1 as read' }));
    expect(requests.some((r) => r.url === '/api/notifications/read')).toBe(true);
    await screen.findByText(/Turn on the daily digest/);
    expect(screen.queryByRole('button', { name: /Mark all/ })).not.toBeInTheDocument();
    expect(screen.queryByText('New')).not.toBeInTheDocument();
  });

  it('says so when there are none', async () => {
    mockApi({
      'GET /api/notifications': () => ({ body: { data: [] } }),
      'GET /api/notifications/unread': () => ({ body: { data: { unread: 0 } } }),
    });
    renderApp({ route: '/notices', session: buildSession(buildUser()) });
    expect(await screen.findByText('No notices yet')).toBeInTheDocument();
  });
});

describe('NoticeList', () => {
  it('reports an unread notice when its link is followed, and not a read one', async () => {
    const opened: number[] = [];
    renderWithProviders(
      <NoticeList
        notices={[
          notice({ id: 5, message: 'Unread one' }),
          notice({ id: 4, message: 'Read one', readAt: '2026-11-30T09:00:00.000Z' }),
          notice({ id: 3, message: 'Without a link', link: null }),
        ]}
        onOpen={(n) => opened.push(n.id)}
      />,
      { session: buildSession(buildUser()) },
    );
    const user = userEvent.setup();
    await user.click(screen.getByRole('link', { name: 'Read one' }));
    await user.click(screen.getByRole('link', { name: 'Unread one' }));
    expect(opened).toEqual([5]);
    expect(screen.queryByRole('link', { name: 'Without a link' })).not.toBeInTheDocument();
    expect(screen.getAllByText('New')).toHaveLength(2);
  });
});

describe('Stop-digest page', () => {
  // Digests mailed before the rename link to /notifications/stop-digest: it redirects with the token.
  it.each(['/notices/stop-digest', '/notifications/stop-digest'])(
    'asks first, then stops the digest with the token from the link (%s)',
    async (address) => {
      const { requests, fetchMock } = mockApi({
        'POST /api/account/digest/stop': () => ({ body: { data: { stopped: true } } }),
      });
      const { location } = renderApp({
        route: `${address}?token=12.abc_def-ghi`,
        session: buildSession(null),
      });
      const button = await screen.findByRole('button', { name: 'Stop the digest' });
      expect(fetchMock).not.toHaveBeenCalledWith(
        expect.stringContaining('/digest/stop'),
        expect.anything(),
      );
      await userEvent.setup().click(button);
      expect(await screen.findByText('The daily digest is off')).toBeInTheDocument();
      expect(requests.filter((r) => r.method === 'POST')).toMatchObject([
        { url: '/api/account/digest/stop', body: { token: '12.abc_def-ghi' } },
      ]);
      expect(location.current.pathname).toBe('/notices/stop-digest');
    },
  );

  it('explains a forged or broken link', async () => {
    mockApi({
      'POST /api/account/digest/stop': () =>
        errorReply(400, 'VALIDATION_FAILED', 'This stop link is not valid', {
          token: 'This link is not valid: use the link in your newest digest e-mail',
        }),
    });
    renderApp({
      route: '/notices/stop-digest?token=1.forged-token-here',
      session: buildSession(null),
    });
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Stop the digest' }));
    expect(
      await screen.findByText(/use the link in your newest digest e-mail/),
    ).toBeInTheDocument();
  });

  it('does not offer to stop anything without a token', async () => {
    mockApi({});
    renderApp({ route: '/notices/stop-digest', session: buildSession(null) });
    expect(await screen.findByText(/This link has no token/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Stop the digest' })).toBeDisabled();
  });
});
