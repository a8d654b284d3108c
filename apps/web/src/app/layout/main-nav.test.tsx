import '@/testing/setup';
import type {
  ModerationCountDto,
  ModerationQueueDto,
  PostSummaryDto,
  ThreadDto,
} from '@app/shared';
import { focusManager } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const club = { name: 'Gullwing Cove Cruising Club', harbors: [] };

const count = (pendingPosts: number, openReports = 0): ModerationCountDto => ({
  pendingPosts,
  pendingComments: 0,
  openReports,
  openListingReports: 0,
  total: pendingPosts + openReports,
});

const pendingPost = (id: number, title: string): PostSummaryDto => ({
  id,
  kind: 'article',
  title,
  excerpt: 'An invented excerpt.',
  status: 'pending',
  visibility: 'public',
  topic: { id: 1, slug: 'anchoring', name: 'Anchoring' },
  author: { id: 9, displayName: 'Tamsin Keel' },
  hasSetup: false,
  helpfulCount: 0,
  commentCount: 0,
  answered: false,
  pinned: false,
  locked: false,
  publishedAt: null,
  updatedAt: '2026-05-01T10:00:00.000Z',
});

const mainNav = () => screen.findByRole('navigation', { name: 'Main' });

describe('moderation badge in the main navigation', () => {
  it('reads out how many items wait for a moderator', async () => {
    mockApi({
      'GET /api/club': () => ({ body: { data: club } }),
      'GET /api/moderation/count': () => ({ body: { data: count(2, 1) } }),
    });
    renderApp({ route: '/', session: buildSession(buildUser({ roles: ['member', 'moderator'] })) });
    const link = await within(await mainNav()).findByRole('link', {
      name: 'Moderation, 3 waiting',
    });
    expect(link).toHaveAttribute('href', '/moderation');
    expect(link).toHaveTextContent('Moderation3');
  });

  it('shows the plain label when nothing waits', async () => {
    mockApi({
      'GET /api/club': () => ({ body: { data: club } }),
      'GET /api/moderation/count': () => ({ body: { data: count(0) } }),
    });
    const { queryClient } = renderApp({
      route: '/',
      session: buildSession(buildUser({ roles: ['member', 'moderator'] })),
    });
    await waitFor(() => expect(queryClient.getQueryData(['moderation', 'count'])).toBeDefined());
    expect(within(await mainNav()).getByRole('link', { name: 'Moderation' })).toBeInTheDocument();
  });

  it('never asks for the count for a member without the moderator role', async () => {
    const { requests } = mockApi({
      'GET /api/club': () => ({ body: { data: club } }),
    });
    renderApp({ route: '/', session: buildSession(buildUser({ roles: ['member'] })) });
    await within(await mainNav()).findByRole('link', { name: 'Dues' });
    expect(requests.some((r) => r.url.startsWith('/api/moderation'))).toBe(false);
  });

  it('goes down after the moderator approves a post from the queue', async () => {
    let queue: ModerationQueueDto = {
      posts: [pendingPost(1, 'Bridle legs of equal length'), pendingPost(2, 'Chafe on a roller')],
      comments: [],
      reports: [],
    };
    const session = buildSession(buildUser({ roles: ['member', 'moderator'] }));
    mockApi({
      'GET /api/club': () => ({ body: { data: club } }),
      'GET /api/moderation/count': () => ({ body: { data: count(queue.posts.length) } }),
      'GET /api/moderation/queue': () => ({ body: { data: queue } }),
      'GET /api/listings/reports': () => ({ body: { data: [] } }),
      // Every query refreshes after a decision, the session included.
      'GET /api/auth/me': () => ({ body: { data: session } }),
      'POST /api/moderation/posts/1/decision': () => {
        queue = { ...queue, posts: queue.posts.filter((p) => p.id !== 1) };
        return { body: { data: { id: 1, status: 'approved', decisionId: 9 } } };
      },
    });
    renderApp({ route: '/moderation', session });
    const nav = await mainNav();
    await within(nav).findByRole('link', { name: 'Moderation, 2 waiting' });
    await userEvent
      .setup()
      .click(await screen.findByRole('button', { name: 'Publish “Bridle legs of equal length”' }));
    expect(
      await within(nav).findByRole('link', { name: 'Moderation, 1 waiting' }),
    ).toBeInTheDocument();
    // The decided post stays in place, marked published, until the moderator leaves the page.
    expect(await screen.findByText('Published', { exact: true })).toBeInTheDocument();
    expect(
      screen.queryByRole('button', { name: 'Publish “Bridle legs of equal length”' }),
    ).not.toBeInTheDocument();
  });
});

const thread = (unread: number): ThreadDto => ({
  id: 4,
  listingId: 12,
  listingTitle: 'Grade 43 chain, 30 m',
  listingStatus: 'active',
  otherParty: { id: 8, displayName: 'Tamsin Keel' },
  role: 'seller',
  lastMessage: 'Is it still for sale?',
  lastMessageAt: '2026-05-01T10:00:00.000Z',
  unread,
  soldToThisThread: false,
  messages: [
    {
      id: 1,
      senderId: 8,
      mine: false,
      body: 'Is it still for sale?',
      createdAt: '2026-05-01T10:00:00.000Z',
    },
  ],
});

describe('messages badge in the main navigation', () => {
  it('reads out the unread count, and drops it once the thread is read', async () => {
    let unread = 2;
    const { requests } = mockApi({
      'GET /api/club': () => ({ body: { data: club } }),
      'GET /api/threads/unread': () => ({ body: { data: { unread } } }),
      'GET /api/threads': () => ({ body: { data: [thread(unread)] } }),
      'GET /api/threads/4': () => {
        unread = 0; // the server marks the thread read when it is opened
        return { body: { data: thread(0) } };
      },
    });
    renderApp({ route: '/', session: buildSession(buildUser({ roles: ['member'] })) });
    const nav = await mainNav();
    const link = await within(nav).findByRole('link', { name: 'Messages, 2 unread' });
    expect(link).toHaveTextContent('Messages2');
    await userEvent.setup().click(link);
    await userEvent.setup().click(await screen.findByRole('link', { name: /Grade 43 chain/ }));
    expect(await within(nav).findByRole('link', { name: 'Messages' })).toBeInTheDocument();
    expect(requests.filter((r) => r.url === '/api/threads/unread').length).toBeGreaterThan(1);
  });

  it('asks again when the member comes back to the tab', async () => {
    let unread = 0;
    mockApi({
      'GET /api/club': () => ({ body: { data: club } }),
      'GET /api/threads/unread': () => ({ body: { data: { unread } } }),
    });
    const { queryClient } = renderApp({
      route: '/',
      session: buildSession(buildUser({ roles: ['member'] })),
    });
    await waitFor(() => expect(queryClient.getQueryData(['threads', 'unread'])).toBeDefined());
    unread = 1;
    // Fetched 20 s ago (past the 10 s freshness): coming back to the tab refetches.
    const query = queryClient.getQueryCache().find({ queryKey: ['threads', 'unread'] });
    query?.setState({ dataUpdatedAt: Date.now() - 20_000 });
    focusManager.setFocused(false);
    focusManager.setFocused(true);
    expect(
      await within(await mainNav()).findByRole('link', { name: 'Messages, 1 unread' }),
    ).toBeInTheDocument();
    focusManager.setFocused(undefined);
  });

  it('never asks a visitor for unread messages', async () => {
    const { requests } = mockApi({ 'GET /api/club': () => ({ body: { data: club } }) });
    renderApp({ route: '/', session: buildSession(null) });
    await within(await mainNav()).findByRole('link', { name: 'Sign in' });
    expect(requests.some((r) => r.url.startsWith('/api/threads'))).toBe(false);
  });
});

describe('grouped menus in the main navigation', () => {
  it("opens the member's account menu, closes it with Escape and returns focus to its button", async () => {
    mockApi({ 'GET /api/club': () => ({ body: { data: club } }) });
    renderApp({ route: '/', session: buildSession(buildUser({ roles: ['member'] })) });
    const user = userEvent.setup();
    const nav = await mainNav();
    const button = await within(nav).findByRole('button', { name: 'Account' });
    expect(button).toHaveAttribute('aria-expanded', 'false');
    const menu = within(nav).getByRole('list', { name: 'Account' });
    expect(within(menu).getByRole('link', { name: 'Dues' })).toHaveAttribute('href', '/dues');
    expect(within(menu).getByRole('button', { name: 'Sign out' })).toBeInTheDocument();
    await user.click(button);
    expect(button).toHaveAttribute('aria-expanded', 'true');
    await user.keyboard('{Escape}');
    expect(button).toHaveAttribute('aria-expanded', 'false');
    expect(button).toHaveFocus();
  });

  it('puts the moderation count on the Desks button', async () => {
    mockApi({
      'GET /api/club': () => ({ body: { data: club } }),
      'GET /api/moderation/count': () => ({ body: { data: count(4) } }),
    });
    renderApp({ route: '/', session: buildSession(buildUser({ roles: ['member', 'moderator'] })) });
    expect(
      await within(await mainNav()).findByRole('button', { name: 'Desks, 4 waiting' }),
    ).toHaveAttribute('aria-controls');
  });
});
