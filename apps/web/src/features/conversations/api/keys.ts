/** Query keys for conversations. */
export const conversationKeys = {
  all: ['threads'] as const,
  list: () => [...conversationKeys.all, 'list'] as const,
  unread: () => [...conversationKeys.all, 'unread'] as const,
  detail: (id: number) => [...conversationKeys.all, 'detail', id] as const,
};
