/** Query keys for the tackle-plans resource. */
export const tacklePlanKeys = {
  all: ['tackle-plans'] as const,
  lists: () => [...tacklePlanKeys.all, 'list'] as const,
  list: (boatId: number) => [...tacklePlanKeys.lists(), { boatId }] as const,
  detail: (planId: number) => [...tacklePlanKeys.all, 'detail', planId] as const,
};
