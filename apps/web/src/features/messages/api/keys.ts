/** Query keys for conversations. */
export const threadKeys = {
  all: ['threads'] as const,
  list: () => [...threadKeys.all, 'list'] as const,
  unread: () => [...threadKeys.all, 'unread'] as const,
  detail: (id: number) => [...threadKeys.all, 'detail', id] as const,
};
