import { createBrowserRouter, generatePath, redirect, type RouteObject } from 'react-router-dom';
import { OLD_PATHS, paths } from '@/config/paths';
import { AppLayout } from './layout/app-layout';
import { PageFallback } from './layout/page-fallback';
import { RouteErrorBoundary } from './routes/route-error';

/**
 * Every screen, lazy-loaded so each becomes its own chunk. To add one: a path in `config/paths.ts`,
 * a file in `app/routes/`, and one entry here (and a nav item in `config/nav.ts` if it belongs there).
 */
export const SCREEN_ROUTES: RouteObject[] = [
  { index: true, lazy: async () => ({ Component: (await import('./routes/home')).HomeRoute }) },
  {
    path: paths.signIn.path,
    lazy: async () => ({ Component: (await import('./routes/sign-in')).SignInRoute }),
  },
  {
    path: paths.signUp.path,
    lazy: async () => ({ Component: (await import('./routes/sign-up')).SignUpRoute }),
  },
  {
    path: paths.verifyEmail.path,
    lazy: async () => ({ Component: (await import('./routes/verify-email')).VerifyEmailRoute }),
  },
  {
    path: paths.resetPassword.path,
    lazy: async () => ({ Component: (await import('./routes/reset-password')).ResetPasswordRoute }),
  },
  {
    path: paths.account.path,
    lazy: async () => ({ Component: (await import('./routes/account')).AccountRoute }),
  },
  {
    path: paths.notices.path,
    lazy: async () => ({
      Component: (await import('./routes/notices')).NoticesRoute,
    }),
  },
  {
    path: paths.stopDigest.path,
    lazy: async () => ({ Component: (await import('./routes/stop-digest')).StopDigestRoute }),
  },
  {
    path: paths.adminUsers.path,
    lazy: async () => ({ Component: (await import('./routes/admin-users')).AdminUsersRoute }),
  },
  {
    path: paths.adminTopics.path,
    lazy: async () => ({ Component: (await import('./routes/admin-topics')).AdminTopicsRoute }),
  },
  {
    path: paths.adminClub.path,
    lazy: async () => ({ Component: (await import('./routes/admin-club')).AdminClubRoute }),
  },
  {
    path: paths.calculators.path,
    lazy: async () => ({ Component: (await import('./routes/calculators')).CalculatorsRoute }),
  },
  {
    path: paths.boats.path,
    lazy: async () => ({ Component: (await import('./routes/boats')).BoatsRoute }),
  },
  {
    path: paths.boat.path,
    lazy: async () => ({ Component: (await import('./routes/boat')).BoatRoute }),
  },
  {
    path: paths.tacklePlan.path,
    lazy: async () => ({ Component: (await import('./routes/tackle-plan')).TacklePlanRoute }),
  },
  {
    path: paths.storm.path,
    lazy: async () => ({ Component: (await import('./routes/storm')).StormRoute }),
  },
  {
    path: paths.stormNew.path,
    lazy: async () => ({ Component: (await import('./routes/storm-new')).StormNewRoute }),
  },
  {
    path: paths.stormChecklist.path,
    lazy: async () => ({
      Component: (await import('./routes/storm-checklist')).StormChecklistRoute,
    }),
  },
  {
    path: paths.stormWatch.path,
    lazy: async () => ({ Component: (await import('./routes/storm-watch')).StormWatchRoute }),
  },
  {
    path: paths.stormBoard.path,
    lazy: async () => ({ Component: (await import('./routes/storm-board')).StormBoardRoute }),
  },
  {
    path: paths.stormBoat.path,
    lazy: async () => ({ Component: (await import('./routes/storm-boat')).StormBoatRoute }),
  },
  {
    path: paths.dues.path,
    lazy: async () => ({ Component: (await import('./routes/dues')).DuesRoute }),
  },
  {
    path: paths.duesPaid.path,
    lazy: async () => ({ Component: (await import('./routes/dues-paid')).DuesPaidRoute }),
  },
  {
    path: paths.treasury.path,
    lazy: async () => ({ Component: (await import('./routes/treasury')).TreasuryRoute }),
  },
  {
    path: paths.treasuryRoster.path,
    lazy: async () => ({
      Component: (await import('./routes/treasury-roster')).TreasuryRosterRoute,
    }),
  },
  {
    path: paths.membershipPlans.path,
    lazy: async () => ({
      Component: (await import('./routes/treasury-membership-plans')).MembershipPlansRoute,
    }),
  },
  {
    path: paths.knowledge.path,
    lazy: async () => ({ Component: (await import('./routes/knowledge')).KnowledgeRoute }),
  },
  {
    path: paths.postNew.path,
    lazy: async () => ({ Component: (await import('./routes/post-edit')).PostEditRoute }),
  },
  {
    path: paths.post.path,
    lazy: async () => ({ Component: (await import('./routes/post')).PostRoute }),
  },
  {
    path: paths.postEdit.path,
    lazy: async () => ({ Component: (await import('./routes/post-edit')).PostEditRoute }),
  },
  {
    path: paths.moderation.path,
    lazy: async () => ({ Component: (await import('./routes/moderation')).ModerationRoute }),
  },
  {
    path: paths.moderationLog.path,
    lazy: async () => ({
      Component: (await import('./routes/moderation-log')).ModerationLogRoute,
    }),
  },
  {
    path: paths.exchange.path,
    lazy: async () => ({ Component: (await import('./routes/exchange')).ExchangeRoute }),
  },
  {
    path: paths.exchangeMine.path,
    lazy: async () => ({ Component: (await import('./routes/exchange-mine')).ExchangeMineRoute }),
  },
  {
    path: paths.listingNew.path,
    lazy: async () => ({ Component: (await import('./routes/listing-new')).ListingNewRoute }),
  },
  {
    path: paths.listing.path,
    lazy: async () => ({ Component: (await import('./routes/listing')).ListingRoute }),
  },
  {
    path: paths.listingEdit.path,
    lazy: async () => ({ Component: (await import('./routes/listing-edit')).ListingEditRoute }),
  },
  {
    path: paths.messages.path,
    lazy: async () => ({ Component: (await import('./routes/messages')).MessagesRoute }),
  },
  {
    path: paths.conversation.path,
    lazy: async () => ({ Component: (await import('./routes/conversation')).ConversationRoute }),
  },
  ...OLD_PATHS.map(({ from, to }): RouteObject => ({
    path: from,
    loader: ({ params, request }) =>
      redirect(`${generatePath(to, params)}${new URL(request.url).search}`),
  })),
  {
    path: '*',
    lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }),
  },
];

/** The whole route tree: the layout around every screen, with an error boundary inside the layout. */
export const APP_ROUTES: RouteObject[] = [
  {
    path: '/',
    Component: AppLayout,
    HydrateFallback: PageFallback,
    ErrorBoundary: RouteErrorBoundary,
    children: [{ ErrorBoundary: RouteErrorBoundary, children: SCREEN_ROUTES }],
  },
];

/** Creates the browser router for the app. */
export const createAppRouter = () => createBrowserRouter(APP_ROUTES);
