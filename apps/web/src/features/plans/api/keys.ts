/** Query keys for the tackle-plans resource. */
export const planKeys = {
  all: ['tackle-plans'] as const,
  lists: () => [...planKeys.all, 'list'] as const,
  list: (boatId: number) => [...planKeys.lists(), { boatId }] as const,
  detail: (planId: number) => [...planKeys.all, 'detail', planId] as const,
};
