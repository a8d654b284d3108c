import { createElement, lazy, type ComponentType, type ReactElement } from 'react';
import type { RouteObject } from 'react-router-dom';
import { OLD_PATHS, paths } from '@/config/paths';
import { AppLayout } from './layout/app-layout';
import { OldPathRedirect } from './layout/old-path-redirect';

/** A screen as a lazily loaded element: its module becomes its own chunk, fetched when the route first renders. */
function screen<K extends string>(
  load: () => Promise<Record<K, ComponentType>>,
  name: K,
): ReactElement {
  return createElement(lazy(async () => ({ default: (await load())[name] })));
}

/**
 * Every screen, lazy-loaded so each becomes its own chunk (React.lazy; the layout holds the Suspense boundary and
 * the error boundary). Declarative routes keep the data router (loaders, actions, fetchers: about 16 KB gzipped)
 * out of every first load; the app uses none of it. To add a screen: a path in `config/paths.ts`, a file in
 * `app/routes/`, and one entry here (and a nav item in `config/nav.ts` if it belongs there).
 */
export const SCREEN_ROUTES: RouteObject[] = [
  { index: true, element: screen(() => import('./routes/home'), 'HomeRoute') },
  {
    path: paths.signIn.path,
    element: screen(() => import('./routes/sign-in'), 'SignInRoute'),
  },
  {
    path: paths.signUp.path,
    element: screen(() => import('./routes/sign-up'), 'SignUpRoute'),
  },
  {
    path: paths.verifyEmail.path,
    element: screen(() => import('./routes/verify-email'), 'VerifyEmailRoute'),
  },
  {
    path: paths.resetPassword.path,
    element: screen(() => import('./routes/reset-password'), 'ResetPasswordRoute'),
  },
  {
    path: paths.account.path,
    element: screen(() => import('./routes/account'), 'AccountRoute'),
  },
  {
    path: paths.notices.path,
    element: screen(() => import('./routes/notices'), 'NoticesRoute'),
  },
  {
    path: paths.stopDigest.path,
    element: screen(() => import('./routes/stop-digest'), 'StopDigestRoute'),
  },
  {
    path: paths.adminUsers.path,
    element: screen(() => import('./routes/admin-users'), 'AdminUsersRoute'),
  },
  {
    path: paths.adminTopics.path,
    element: screen(() => import('./routes/admin-topics'), 'AdminTopicsRoute'),
  },
  {
    path: paths.adminClub.path,
    element: screen(() => import('./routes/admin-club'), 'AdminClubRoute'),
  },
  {
    path: paths.calculators.path,
    element: screen(() => import('./routes/calculators'), 'CalculatorsRoute'),
  },
  {
    path: paths.boats.path,
    element: screen(() => import('./routes/boats'), 'BoatsRoute'),
  },
  {
    path: paths.boat.path,
    element: screen(() => import('./routes/boat'), 'BoatRoute'),
  },
  {
    path: paths.tacklePlan.path,
    element: screen(() => import('./routes/tackle-plan'), 'TacklePlanRoute'),
  },
  {
    path: paths.storm.path,
    element: screen(() => import('./routes/storm'), 'StormRoute'),
  },
  {
    path: paths.stormNew.path,
    element: screen(() => import('./routes/storm-new'), 'StormNewRoute'),
  },
  {
    path: paths.stormChecklist.path,
    element: screen(() => import('./routes/storm-checklist'), 'StormChecklistRoute'),
  },
  {
    path: paths.stormWatch.path,
    element: screen(() => import('./routes/storm-watch'), 'StormWatchRoute'),
  },
  {
    path: paths.stormBoard.path,
    element: screen(() => import('./routes/storm-board'), 'StormBoardRoute'),
  },
  {
    path: paths.stormBoat.path,
    element: screen(() => import('./routes/storm-boat'), 'StormBoatRoute'),
  },
  {
    path: paths.dues.path,
    element: screen(() => import('./routes/dues'), 'DuesRoute'),
  },
  {
    path: paths.duesPaid.path,
    element: screen(() => import('./routes/dues-paid'), 'DuesPaidRoute'),
  },
  {
    path: paths.treasury.path,
    element: screen(() => import('./routes/treasury'), 'TreasuryRoute'),
  },
  {
    path: paths.treasuryRoster.path,
    element: screen(() => import('./routes/treasury-roster'), 'TreasuryRosterRoute'),
  },
  {
    path: paths.membershipPlans.path,
    element: screen(() => import('./routes/treasury-membership-plans'), 'MembershipPlansRoute'),
  },
  {
    path: paths.knowledge.path,
    element: screen(() => import('./routes/knowledge'), 'KnowledgeRoute'),
  },
  {
    path: paths.postNew.path,
    element: screen(() => import('./routes/post-edit'), 'PostEditRoute'),
  },
  {
    path: paths.post.path,
    element: screen(() => import('./routes/post'), 'PostRoute'),
  },
  {
    path: paths.postEdit.path,
    element: screen(() => import('./routes/post-edit'), 'PostEditRoute'),
  },
  {
    path: paths.moderation.path,
    element: screen(() => import('./routes/moderation'), 'ModerationRoute'),
  },
  {
    path: paths.moderationLog.path,
    element: screen(() => import('./routes/moderation-log'), 'ModerationLogRoute'),
  },
  {
    path: paths.exchange.path,
    element: screen(() => import('./routes/exchange'), 'ExchangeRoute'),
  },
  {
    path: paths.exchangeMine.path,
    element: screen(() => import('./routes/exchange-mine'), 'ExchangeMineRoute'),
  },
  {
    path: paths.listingNew.path,
    element: screen(() => import('./routes/listing-new'), 'ListingNewRoute'),
  },
  {
    path: paths.listing.path,
    element: screen(() => import('./routes/listing'), 'ListingRoute'),
  },
  {
    path: paths.listingEdit.path,
    element: screen(() => import('./routes/listing-edit'), 'ListingEditRoute'),
  },
  {
    path: paths.messages.path,
    element: screen(() => import('./routes/messages'), 'MessagesRoute'),
  },
  {
    path: paths.conversation.path,
    element: screen(() => import('./routes/conversation'), 'ConversationRoute'),
  },
  ...OLD_PATHS.map(({ from, to }): RouteObject => ({
    path: from,
    element: <OldPathRedirect to={to} />,
  })),
  { path: '*', element: screen(() => import('./routes/not-found'), 'NotFoundRoute') },
];

/** The whole route tree: the layout (with its loading and error boundaries) around every screen. */
export const APP_ROUTES: RouteObject[] = [
  { path: '/', element: <AppLayout />, children: SCREEN_ROUTES },
];
