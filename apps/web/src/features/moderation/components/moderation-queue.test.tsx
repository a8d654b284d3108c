import '../../../testing/setup';
import type { ListingReportDto, ModerationQueueDto, PostSummaryDto } from '@app/shared';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '../../../testing/builders';
import { mockApi, type MockRequest } from '../../../testing/mock-api';
import { renderApp } from '../../../testing/render';

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

function api() {
  const queue: ModerationQueueDto = { posts: [post], comments: [], reports: [] };
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
    'POST /api/moderation/posts/4/decision': () => ({
      body: { data: { id: 4, status: 'rejected' } },
    }),
    'POST /api/listings/12/hide': () => ({ body: { data: { id: 12, hidden: true } } }),
    'POST /api/listings/reports/31/dismiss': () => ({ status: 204 }),
  });
}

const moderator = buildSession(buildUser({ roles: ['member', 'moderator'] }));
const writes = (requests: MockRequest[]) =>
  requests.filter((r) => r.method !== 'GET').map((r) => [r.url, r.body]);

describe('moderation queue', () => {
  it('asks for a rejection reason in a dialog, refuses a short one, and sends nothing on cancel', async () => {
    const { requests } = api();
    renderApp({ route: '/moderation', session: moderator });
    const user = userEvent.setup();
    const reject = async () => {
      const item = (await screen.findByRole('link', { name: post.title })).closest('li');
      await user.click(within(item as HTMLElement).getByRole('button', { name: 'Reject' }));
      return screen.findByRole('dialog', { name: `Reject “${post.title}”?` });
    };
    let dialog = await reject();
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(writes(requests)).toEqual([]);

    dialog = await reject();
    const field = within(dialog).getByLabelText('Reason');
    await user.type(field, 'no');
    await user.click(within(dialog).getByRole('button', { name: 'Reject post' }));
    expect(within(dialog).getByText('Reason needs at least 3 characters.')).toBeInTheDocument();
    expect(writes(requests)).toEqual([]);
    await user.type(field, ' setup figures are missing');
    await user.click(within(dialog).getByRole('button', { name: 'Reject post' }));
    await screen.findByRole('button', { name: `Approve “${post.title}”` });
    expect(writes(requests)).toEqual([
      [
        '/api/moderation/posts/4/decision',
        { action: 'reject', reason: 'no setup figures are missing' },
      ],
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

    await user.click(
      within(section).getByRole('button', {
        name: `Dismiss the report on “${listingReport.listingTitle}”`,
      }),
    );
    dialog = await screen.findByRole('dialog', { name: /Dismiss the report/ });
    await user.type(
      within(dialog).getByLabelText(/Note for the log/),
      'Seller sent a better photo',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Dismiss report' }));
    await screen.findByRole('region', { name: 'Listings reported (1)' });
    expect(writes(requests)).toEqual([
      ['/api/listings/12/hide', { reason: 'Misdescribed anchor type' }],
      ['/api/listings/reports/31/dismiss', { note: 'Seller sent a better photo' }],
    ]);
  });
});
