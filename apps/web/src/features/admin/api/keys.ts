/** Query keys for the admin users resource. */
export const adminUserKeys = {
  all: ['admin-users'] as const,
  lists: () => [...adminUserKeys.all, 'list'] as const,
  list: (filters: { q: string }) => [...adminUserKeys.lists(), filters] as const,
};
