import '@/testing/setup';
import type { ListingDto, ThreadSummaryDto } from '@app/shared';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { OwnerActions } from './owner-actions';

const listing = (over: Partial<ListingDto> = {}): ListingDto => ({
  id: 5,
  category: 'chain',
  title: 'Spare chain',
  condition: 'good',
  priceCents: 10000,
  currency: 'EUR',
  harborId: 1,
  harborName: 'Test Harbour',
  specs: { grade: 'G43', tradeSizeIn: 0.3125, lengthM: 40, galvanizing: 'good' },
  sizeMm: 7.9,
  thumbUrl: null,
  publishedAt: '2026-11-01T10:00:00.000Z',
  description: 'Chain.',
  status: 'active',
  hidden: false,
  expiresAt: '2026-12-31T10:00:00.000Z',
  soldAt: null,
  photos: [],
  seller: { id: 1, displayName: 'Test Seller', memberSince: '2024-01-01' },
  isMine: true,
  createdAt: '2026-11-01T10:00:00.000Z',
  updatedAt: '2026-11-01T10:00:00.000Z',
  ...over,
});

const thread = (id: number, name: string): ThreadSummaryDto => ({
  id,
  listingId: 5,
  listingTitle: 'Spare chain',
  listingStatus: 'active',
  otherParty: { id: id * 10, displayName: name },
  role: 'seller',
  lastMessage: 'Still for sale?',
  lastMessageAt: '2026-11-02T10:00:00.000Z',
  unread: 0,
  soldToThisThread: false,
});

function setup() {
  const api = mockApi({
    'GET /api/listings/5/threads': () => ({
      body: { data: [thread(21, 'Ilka Buyer'), thread(22, 'Pell Asker')] },
    }),
    'POST /api/listings/5/sold': (req) => ({
      body: {
        data: listing({
          status: 'sold',
          soldAt: '2026-11-03T10:00:00.000Z',
          ...((req.body as { threadId?: number }).threadId === 21
            ? { soldTo: { displayName: 'Ilka Buyer', isMe: false } }
            : {}),
        }),
      },
    }),
  });
  renderWithProviders(<OwnerActions listing={listing()} editHref="/exchange/listings/5/edit" />, {
    session: buildSession(buildUser()),
  });
  return { ...api, user: userEvent.setup() };
}

const soldPosts = (requests: Array<{ method: string; url: string; body: unknown }>) =>
  requests.filter((r) => r.method === 'POST' && r.url.endsWith('/listings/5/sold'));

describe('marking a listing sold', () => {
  it('asks first, offering the members who wrote and someone else, and sends the chosen buyer', async () => {
    const { requests, user } = setup();
    await user.click(await screen.findByRole('button', { name: 'Close as sold…' }));
    expect(soldPosts(requests)).toHaveLength(0);
    const dialog = await screen.findByRole('dialog', { name: /Close “Spare chain” as sold\?/ });
    const group = within(dialog).getByRole('group', { name: 'Who took the gear?' });
    expect(
      within(group)
        .getAllByRole('radio')
        .map((r) => r.closest('label')?.textContent),
    ).toEqual(['Ilka Buyer', 'Pell Asker', 'Someone else, or outside the club']);
    const confirm = within(dialog).getByRole('button', { name: 'Close as sold' });
    expect(confirm).toBeDisabled();
    await user.click(within(group).getByLabelText('Ilka Buyer'));
    expect(dialog).toHaveTextContent(/Ilka Buyer gets a notice and an e-mail/);
    expect(dialog).toHaveTextContent(/other member who asked is told it is sold/);
    await user.click(within(dialog).getByRole('button', { name: 'Went to Ilka Buyer' }));
    await waitFor(() => expect(soldPosts(requests)).toHaveLength(1));
    expect(soldPosts(requests)[0]?.body).toEqual({ threadId: 21 });
    expect(
      await screen.findByText(/Marked sold to Ilka Buyer, who has been told/),
    ).toBeInTheDocument();
  });

  it('cancel sends nothing; "someone else" records no buyer', async () => {
    const { requests, user } = setup();
    await user.click(await screen.findByRole('button', { name: 'Close as sold…' }));
    let dialog = await screen.findByRole('dialog');
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(soldPosts(requests)).toHaveLength(0);

    await user.click(screen.getByRole('button', { name: 'Close as sold…' }));
    dialog = await screen.findByRole('dialog');
    await user.click(within(dialog).getByLabelText('Someone else, or outside the club'));
    expect(dialog).toHaveTextContent(/The 2 other members who asked are told it is sold/);
    await user.click(within(dialog).getByRole('button', { name: 'Close as sold' }));
    await waitFor(() => expect(soldPosts(requests)).toHaveLength(1));
    expect(soldPosts(requests)[0]?.body).toEqual({});
  });
});
