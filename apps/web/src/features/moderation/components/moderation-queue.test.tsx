import '@/testing/setup';
import type { ListingReportDto, ModerationQueueDto, PostSummaryDto } from '@app/shared';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { mockApi, type MockRequest } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const post: PostSummaryDto = {
  id: 4,
  kind: 'article',
  title: 'Nylon snubber on a chain hook',
  excerpt: 'An invented excerpt.',
  status: 'pending',
  visibility: 'public',
  topic: { id: 1, slug: 'snubbers', name: 'Snubbers and bridles' },
  author: { id: 9, displayName: 'Tamsin Keel' },
  hasSetup: false,
  helpfulCount: 0,
  commentCount: 0,
  answered: false,
  pinned: false,
  locked: false,
  publishedAt: null,
  updatedAt: '2026-05-01T10:00:00.000Z',
};
const listingReport: ListingReportDto = {
  id: 31,
  listingId: 12,
  listingTitle: 'Claw anchor, 15 kg',
  reporterName: 'Orla Sheave',
  reason: 'Pictured anchor is a different type',
  status: 'open',
  createdAt: '2026-05-02T09:00:00.000Z',
};

const next: PostSummaryDto = { ...post, id: 5, title: 'Kellet on a short scope' };

function api() {
  const queue: ModerationQueueDto = { posts: [post, next], comments: [], reports: [] };
  return mockApi({
    'GET /api/club': () => ({ body: { data: { name: 'Gullwing Cove', harbors: [] } } }),
    'GET /api/moderation/count': () => ({
      body: {
        data: {
          pendingPosts: 1,
          pendingComments: 0,
          openReports: 0,
          openListingReports: 1,
          total: 2,
        },
      },
    }),
    'GET /api/auth/me': () => ({ body: { data: moderator } }),
    'GET /api/moderation/queue': () => ({ body: { data: queue } }),
    'GET /api/listings/reports': () => ({ body: { data: [listingReport] } }),
    'POST /api/moderation/posts/4/decision': (req) => {
      // The post leaves the queue once decided; the screen keeps it in place.
      queue.posts = queue.posts.filter((p) => p.id !== 4);
      const action = (req.body as { action: string }).action;
      return {
        body: {
          data: { id: 4, status: action === 'publish' ? 'approved' : 'rejected', decisionId: 70 },
        },
      };
    },
    'POST /api/moderation/decisions/70/undo': () => {
      queue.posts = [post, next];
      return {
        body: { data: { id: 70, subjectType: 'post', subjectId: 4, undoneAt: post.updatedAt } },
      };
    },
    'POST /api/listings/12/hide': () => ({
      body: { data: { id: 12, hidden: true, decisionId: 71 } },
    }),
    'POST /api/moderation/decisions/71/undo': () => ({
      body: { data: { id: 71, subjectType: 'listing', subjectId: 12, undoneAt: post.updatedAt } },
    }),
    'POST /api/listings/reports/31/dismiss': () => ({
      body: { data: { id: 31, status: 'resolved', decisionId: 72 } },
    }),
  });
}

const moderator = buildSession(buildUser({ roles: ['member', 'moderator'] }));
const writes = (requests: MockRequest[]) =>
  requests.filter((r) => r.method !== 'GET').map((r) => [r.url, r.body]);

describe('moderation queue', () => {
  it(
    'asks for a reason to decline in a dialog, refuses a short one, and sends nothing on cancel',
    {
      timeout: 15_000,
    },
    async () => {
      const { requests } = api();
      renderApp({ route: '/moderation', session: moderator });
      const user = userEvent.setup();
      const reject = async () => {
        const item = (await screen.findByRole('link', { name: post.title })).closest('li');
        await user.click(
          within(item as HTMLElement).getByRole('button', { name: `Decline “${post.title}”` }),
        );
        return screen.findByRole('dialog', { name: `Decline “${post.title}”?` });
      };
      let dialog = await reject();
      await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
      expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
      expect(writes(requests)).toEqual([]);

      dialog = await reject();
      const field = within(dialog).getByLabelText('Reason');
      await user.type(field, 'no');
      await user.click(within(dialog).getByRole('button', { name: 'Decline post' }));
      expect(within(dialog).getByText('Reason needs at least 3 characters.')).toBeInTheDocument();
      expect(writes(requests)).toEqual([]);
      await user.type(field, ' setup figures are missing');
      await user.click(within(dialog).getByRole('button', { name: 'Decline post' }));
      await screen.findByText('Declined');
      expect(writes(requests)).toEqual([
        [
          '/api/moderation/posts/4/decision',
          { action: 'decline', reason: 'no setup figures are missing' },
        ],
      ]);
    },
  );

  it('tells publishing and declining apart by fill and text, not colour alone', async () => {
    api();
    renderApp({ route: '/moderation', session: moderator });
    const publish = await screen.findByRole('button', { name: `Publish “${post.title}”` });
    const decline = screen.getByRole('button', { name: `Decline “${post.title}”` });
    expect(publish).toHaveTextContent(/^Publish$/);
    expect(decline).toHaveTextContent(/^Decline…$/);
    expect(publish.className).toMatch(/bg-signal-600/);
    expect(decline.className).toMatch(/border-dashed/);
    expect(decline.className).not.toMatch(/bg-flare-700/);
  });

  it('keeps a published post in place with Undo, so the next post does not move up; Undo restores it', async () => {
    const { requests } = api();
    renderApp({ route: '/moderation', session: moderator });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: `Publish “${post.title}”` }));
    const undo = await screen.findByRole('button', { name: `Undo: published “${post.title}”` });
    // The decided card is still the first item, with its title; the next post is still second.
    const items = within(screen.getByRole('region', { name: /^Posts waiting/ })).getAllByRole(
      'listitem',
    );
    expect(items.map((li) => within(li).getByRole('link').textContent)).toEqual([
      post.title,
      next.title,
    ]);
    expect(within(items[0] as HTMLElement).getByText('Published')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: `Publish “${post.title}”` })).toBeNull();
    expect(screen.getByRole('heading', { name: 'Posts waiting (1)' })).toBeInTheDocument();

    await user.click(undo);
    await screen.findByRole('button', { name: `Publish “${post.title}”` });
    expect(screen.getByText(`Undone: “${post.title}” is waiting again.`)).toBeInTheDocument();
    expect(writes(requests)).toEqual([
      ['/api/moderation/posts/4/decision', { action: 'publish', reason: '' }],
      ['/api/moderation/decisions/70/undo', undefined],
    ]);
  });

  it('sends a post back with a note to the author', async () => {
    const { requests } = api();
    renderApp({ route: '/moderation', session: moderator });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: `Send back “${post.title}”` }));
    const dialog = await screen.findByRole('dialog', {
      name: `Send “${post.title}” back to the author?`,
    });
    await user.type(within(dialog).getByLabelText('Note to the author'), 'Add the chain size');
    await user.click(within(dialog).getByRole('button', { name: 'Send back' }));
    await screen.findByText('Sent back to the author');
    expect(writes(requests)).toEqual([
      ['/api/moderation/posts/4/decision', { action: 'send-back', reason: 'Add the chain size' }],
    ]);
  });

  it('lists reported listings with reason, reporter and link; hides with a reason, dismisses with a note', async () => {
    const { requests } = api();
    renderApp({ route: '/moderation', session: moderator });
    const user = userEvent.setup();
    const section = await screen.findByRole('region', { name: 'Listings reported (1)' });
    expect(within(section).getByText(listingReport.reason)).toBeInTheDocument();
    expect(within(section).getByText(/Orla Sheave reported a listing/)).toBeInTheDocument();
    expect(within(section).getByRole('link', { name: listingReport.listingTitle })).toHaveAttribute(
      'href',
      '/exchange/listings/12',
    );

    await user.click(
      within(section).getByRole('button', { name: `Hide listing “${listingReport.listingTitle}”` }),
    );
    let dialog = await screen.findByRole('dialog', {
      name: `Hide “${listingReport.listingTitle}”?`,
    });
    await user.type(within(dialog).getByLabelText('Reason'), 'Misdescribed anchor type');
    await user.click(within(dialog).getByRole('button', { name: 'Hide listing' }));
    await within(section).findByText('Listing hidden');
    await user.click(
      within(section).getByRole('button', {
        name: `Undo: listing hidden “${listingReport.listingTitle}”`,
      }),
    );

    await user.click(
      await within(section).findByRole('button', {
        name: `Dismiss the report on “${listingReport.listingTitle}”`,
      }),
    );
    dialog = await screen.findByRole('dialog', { name: /Dismiss the report/ });
    await user.type(
      within(dialog).getByLabelText(/Note for the log/),
      'Seller sent a better photo',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Dismiss report' }));
    await within(section).findByText('Report dismissed');
    expect(writes(requests)).toEqual([
      ['/api/listings/12/hide', { reason: 'Misdescribed anchor type' }],
      ['/api/moderation/decisions/71/undo', undefined],
      ['/api/listings/reports/31/dismiss', { note: 'Seller sent a better photo' }],
    ]);
  });
});
