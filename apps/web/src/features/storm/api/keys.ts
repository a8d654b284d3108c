/** Query keys for storm watches. */
export const stormKeys = {
  all: ['storm-watches'] as const,
  lists: () => [...stormKeys.all, 'list'] as const,
  detail: (watchId: number) => [...stormKeys.all, 'detail', watchId] as const,
  board: (watchId: number, harborId?: number) =>
    [...stormKeys.all, 'board', watchId, { harborId }] as const,
  boat: (watchId: number, boatId: number) => [...stormKeys.all, 'boat', watchId, boatId] as const,
  buddies: (watchId: number) => [...stormKeys.all, 'buddies', watchId] as const,
  checklist: () => [...stormKeys.all, 'checklist'] as const,
};
