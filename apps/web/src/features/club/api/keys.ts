/** Query keys for the club resource. */
export const clubKeys = {
  all: ['club'] as const,
  detail: () => [...clubKeys.all, 'detail'] as const,
};
