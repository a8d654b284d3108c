/** Query keys for the moderators' desk. */
export const moderationKeys = {
  all: ['moderation'] as const,
  queue: () => [...moderationKeys.all, 'queue'] as const,
  count: () => [...moderationKeys.all, 'count'] as const,
  listingReports: () => [...moderationKeys.all, 'listing-reports'] as const,
  log: (page: number) => [...moderationKeys.all, 'log', page] as const,
};
