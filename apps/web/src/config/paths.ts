/** Route paths (for the router) and href builders (for links). Add a screen here first. */
export const paths = {
  home: { path: '/', href: () => '/' },
  signIn: {
    path: '/sign-in',
    href: (next?: string) => (next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'),
  },
  signUp: { path: '/join', href: () => '/join' },
  verifyEmail: { path: '/verify-email', href: () => '/verify-email' },
  resetPassword: { path: '/reset-password', href: () => '/reset-password' },
  account: { path: '/account', href: () => '/account' },
  notices: { path: '/notices', href: () => '/notices' },
  stopDigest: {
    path: '/notices/stop-digest',
    href: (token: string) => `/notices/stop-digest?token=${encodeURIComponent(token)}`,
  },
  adminUsers: { path: '/admin/users', href: () => '/admin/users' },
  adminTopics: { path: '/admin/topics', href: () => '/admin/topics' },
  adminClub: { path: '/admin/club', href: () => '/admin/club' },
  knowledge: { path: '/knowledge', href: () => '/knowledge' },
  postNew: { path: '/knowledge/new', href: () => '/knowledge/new' },
  post: { path: '/knowledge/:postId', href: (postId: number | string) => `/knowledge/${postId}` },
  postEdit: {
    path: '/knowledge/:postId/edit',
    href: (postId: number | string) => `/knowledge/${postId}/edit`,
  },
  moderation: { path: '/moderation', href: () => '/moderation' },
  moderationLog: { path: '/moderation/log', href: () => '/moderation/log' },
  calculators: { path: '/calculators', href: () => '/calculators' },
  boats: { path: '/boats', href: () => '/boats' },
  boat: { path: '/boats/:boatId', href: (boatId: number | string) => `/boats/${boatId}` },
  tacklePlan: {
    path: '/tackle-plans/:planId',
    href: (planId: number | string) => `/tackle-plans/${planId}`,
  },
  dues: { path: '/dues', href: () => '/dues' },
  duesPaid: { path: '/dues/paid', href: () => '/dues/paid' },
  treasury: { path: '/treasury', href: () => '/treasury' },
  treasuryRoster: { path: '/treasury/roster', href: () => '/treasury/roster' },
  membershipPlans: {
    path: '/treasury/membership-plans',
    href: () => '/treasury/membership-plans',
  },
  exchange: { path: '/exchange', href: () => '/exchange' },
  exchangeMine: { path: '/exchange/mine', href: () => '/exchange/mine' },
  listingNew: { path: '/exchange/new', href: () => '/exchange/new' },
  listing: {
    path: '/exchange/listings/:listingId',
    href: (listingId: number | string, fitsBoat?: number) =>
      `/exchange/listings/${listingId}${fitsBoat ? `?fitsBoat=${fitsBoat}` : ''}`,
  },
  listingEdit: {
    path: '/exchange/listings/:listingId/edit',
    href: (listingId: number | string) => `/exchange/listings/${listingId}/edit`,
  },
  storm: { path: '/storm', href: () => '/storm' },
  stormNew: { path: '/storm/new', href: () => '/storm/new' },
  stormChecklist: { path: '/storm/checklist', href: () => '/storm/checklist' },
  stormWatch: {
    path: '/storm/:watchId',
    href: (watchId: number | string) => `/storm/${watchId}`,
  },
  stormBoard: {
    path: '/storm/:watchId/board',
    href: (watchId: number | string, harborId?: number) =>
      `/storm/${watchId}/board${harborId ? `?harbour=${harborId}` : ''}`,
  },
  stormBoat: {
    path: '/storm/:watchId/boats/:boatId',
    href: (watchId: number | string, boatId: number | string) =>
      `/storm/${watchId}/boats/${boatId}`,
  },
  messages: { path: '/messages', href: () => '/messages' },
  conversation: {
    path: '/messages/:conversationId',
    href: (conversationId: number | string) => `/messages/${conversationId}`,
  },
} as const;

/**
 * Addresses from before the glossary's renames (DEVELOPERS.md): members bookmarked them and older mails link to
 * them, so each keeps working by redirecting, with its query string, to the new address. `:param` parts carry over.
 */
export const OLD_PATHS: ReadonlyArray<{ from: string; to: string }> = [
  { from: '/plans/:planId', to: '/tackle-plans/:planId' },
  { from: '/notifications', to: '/notices' },
  { from: '/notifications/stop-digest', to: '/notices/stop-digest' },
  { from: '/treasury/plans', to: '/treasury/membership-plans' },
];

/**
 * Returns `next` when it is a path inside this app (starts with one `/`), else the home path.
 * Keeps a crafted `?next=` from sending someone to another site after sign-in.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) {
    return paths.home.href();
  }
  return next;
}
