import '@/testing/setup';
import type {
  BoatDto,
  ModerationCountDto,
  MyDuesDto,
  NotificationDto,
  PostSummaryDto,
  SummaryDto,
  TacklePlanDto,
} from '@app/shared';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const club = { name: 'Gullwing Cove Cruising Club', harbors: [] };

const boat = {
  id: 7,
  name: 'Petrel',
  hull: 'sail',
  loaM: 9.1,
  beamM: 3.1,
  displacementKg: 4200,
  draftM: 1.6,
  bowHeightM: 1,
  gypsy: null,
  homeHarborId: 2,
  createdAt: '2026-01-01T10:00:00.000Z',
  updatedAt: '2026-01-01T10:00:00.000Z',
} satisfies BoatDto;

const plan = {
  id: 31,
  boatId: 7,
  name: 'Summer anchorage',
  condition: 'everyday',
  windKn: 30,
  depthM: 6,
  tideM: 2,
  bottom: null,
  components: {
    anchor: { type: 'claw', massKg: 12 },
    chain: { grade: 'G43', nominalMm: 8, lengthM: 30 },
  },
  notes: '',
  createdAt: '2026-02-01T10:00:00.000Z',
  updatedAt: '2026-02-01T10:00:00.000Z',
} as unknown as TacklePlanDto;

const dues = {
  fiscalYear: { id: 1, startsOn: '2026-01-01', endsOn: '2026-12-31' },
  membership: {
    planId: 1,
    planName: 'Full member',
    joinedOn: '2025-03-01',
    paidThrough: '2025-12-31',
  },
  status: 'overdue',
  paidUp: false,
  quote: {
    planId: 1,
    planName: 'Full member',
    currency: 'EUR',
    amountMinor: 12000,
    lines: [],
    coversFrom: '2026-01-01',
    coversTo: '2026-12-31',
    reason: 'renewal',
  },
  offers: [],
  plans: [],
  payments: [],
} as unknown as MyDuesDto;

const notice: NotificationDto = {
  id: 3,
  kind: 'answer',
  message: 'Your question has an accepted answer',
  link: '/knowledge/5',
  readAt: null,
  createdAt: '2026-05-02T09:00:00.000Z',
};

const question = {
  id: 5,
  kind: 'question',
  title: 'Snubber length for a 9 m sloop?',
  excerpt: 'An invented question.',
  status: 'approved',
  visibility: 'public',
  topic: { id: 1, slug: 'anchoring', name: 'Anchoring' },
  author: { id: 9, displayName: 'Tamsin Keel' },
  hasSetup: false,
  helpfulCount: 0,
  commentCount: 1,
  answered: false,
  pinned: false,
  locked: false,
  publishedAt: '2026-05-01T10:00:00.000Z',
  updatedAt: '2026-05-01T10:00:00.000Z',
} satisfies PostSummaryDto;

const memberApi = (extra: Record<string, () => { body: unknown }> = {}) =>
  mockApi({
    'GET /api/club': () => ({ body: { data: club } }),
    'GET /api/boats': () => ({ body: { data: [boat] } }),
    'GET /api/tackle-plans': () => ({ body: { data: [plan] } }),
    'GET /api/dues/me': () => ({ body: { data: dues } }),
    'GET /api/notifications': () => ({ body: { data: [notice] } }),
    'GET /api/posts': () => ({ body: { data: [question] } }),
    'GET /api/listings': () => ({
      body: { data: [], meta: { page: 1, pageSize: 4, total: 0, tookMs: 1 } },
    }),
    'GET /api/listings/mine': () => ({ body: { data: [] } }),
    ...extra,
  });

describe('the member home', () => {
  it("shows the member's boat with the saved plan, the dues owed with a pay link, notices and open questions", async () => {
    const { requests } = memberApi();
    renderApp({ route: '/', session: buildSession(buildUser({ roles: ['member'] })) });
    const boats = await screen.findByRole('region', { name: 'My boats' });
    expect(await within(boats).findByRole('link', { name: 'Summer anchorage' })).toHaveAttribute(
      'href',
      '/tackle-plans/31',
    );
    expect(within(boats).getByText(/Chain: 8 mm grade 43,/)).toBeInTheDocument();
    expect(within(boats).queryByText(/grade grade|G43/i)).toBeNull();
    const duesCard = screen.getByRole('region', { name: 'My dues' });
    expect(await within(duesCard).findByRole('link', { name: 'Pay €120.00' })).toHaveAttribute(
      'href',
      '/dues',
    );
    expect(within(duesCard).getByText('Overdue')).toBeInTheDocument();
    expect(within(duesCard).getByTestId('next-due')).toHaveTextContent('Due from 1 Jan 2026.');
    const notices = screen.getByRole('region', { name: 'Notices' });
    expect(
      await within(notices).findByText('1 unread notice', {}, { timeout: 5000 }),
    ).toBeInTheDocument();
    const questions = screen.getByRole('region', { name: 'Open questions' });
    expect(await within(questions).findByText(/1 comment$/)).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Gear that fits Petrel' })).toBeInTheDocument();
    const search = requests.find((r) => r.url.startsWith('/api/listings?'));
    expect(search?.url).toContain('fitsBoat=7');
    expect(search?.url).toContain('harborId=2');
    expect(screen.queryByRole('region', { name: 'Moderation desk' })).not.toBeInTheDocument();
    expect(requests.some((r) => r.url.startsWith('/api/treasury'))).toBe(false);
  });

  it('shows a seller what they have live and in draft, and the way to list more', async () => {
    const listing = (id: number, title: string, status: string) => ({ id, title, status });
    memberApi({
      'GET /api/listings/mine': () => ({
        body: {
          data: [
            listing(3, 'Spare 8 mm chain, 40 m', 'active'),
            listing(4, 'Old claw anchor', 'draft'),
            listing(5, 'Nylon snubber', 'sold'),
          ],
        },
      }),
    });
    renderApp({ route: '/', session: buildSession(buildUser({ roles: ['member'] })) });
    const card = await screen.findByRole('region', { name: 'Your gear on the exchange' });
    expect(
      await within(card).findByText('1 listing live, 1 draft not yet published'),
    ).toBeInTheDocument();
    expect(within(card).getByRole('link', { name: 'Old claw anchor' })).toHaveAttribute(
      'href',
      '/exchange/listings/4/edit',
    );
    expect(
      within(card).getByRole('link', { name: 'List gear you no longer need' }),
    ).toHaveAttribute('href', '/exchange/new');
  });

  it("puts a moderator's and a treasurer's queues on the same page, with counts", async () => {
    const count: ModerationCountDto = {
      pendingPosts: 2,
      pendingComments: 1,
      openReports: 0,
      openListingReports: 1,
      total: 4,
    };
    const summary = {
      fiscalYear: { id: 1, startsOn: '2026-01-01', endsOn: '2026-12-31' },
      currency: 'EUR',
      months: [],
      collectedMinor: 60000,
      refundedMinor: 0,
      expectedMinor: 120000,
      outstandingMinor: 60000,
      heldCount: 1,
      counts: { current: 5, due: 0, overdue: 3, lapsed: 0 },
    } as unknown as SummaryDto;
    memberApi({
      'GET /api/moderation/count': () => ({ body: { data: count } }),
      'GET /api/treasury/summary': () => ({ body: { data: summary } }),
    });
    renderApp({
      route: '/',
      session: buildSession(buildUser({ roles: ['member', 'moderator', 'treasurer'] })),
    });
    const mod = await screen.findByRole('region', { name: 'Moderation desk' });
    expect(await within(mod).findByText('2 posts waiting')).toBeInTheDocument();
    expect(within(mod).getByText('1 comment waiting')).toBeInTheDocument();
    expect(within(mod).getByText('1 open report')).toBeInTheDocument();
    const treasury = screen.getByRole('region', { name: "Treasurer's desk" });
    expect(await within(treasury).findByText('1 payment held for a check')).toBeInTheDocument();
    expect(within(treasury).getByText('3 members overdue')).toBeInTheDocument();
    expect(
      within(treasury).getByText(/€600\.00 collected of €1,200\.00 expected/),
    ).toBeInTheDocument();
  });
});

describe('the visitor home', () => {
  it('welcomes a visitor with a way in and the recent public posts', async () => {
    memberApi();
    renderApp({ route: '/', session: buildSession(null) });
    expect(await screen.findByRole('heading', { name: 'Welcome aboard' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Join the club online' })).toBeInTheDocument();
    const recent = screen.getByRole('region', { name: 'Recent posts' });
    expect(
      await within(recent).findByRole('link', { name: 'Snubber length for a 9 m sloop?' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Recent listings' })).toBeInTheDocument();
    expect(screen.queryByRole('region', { name: 'My dues' })).not.toBeInTheDocument();
  });
});
