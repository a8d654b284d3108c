/** Query keys for the boats resource. */
export const boatKeys = {
  all: ['boats'] as const,
  lists: () => [...boatKeys.all, 'list'] as const,
  detail: (boatId: number) => [...boatKeys.all, 'detail', boatId] as const,
};
