/** Query keys for the member's in-app notices. */
export const noticeKeys = {
  all: ['notices'] as const,
  list: () => [...noticeKeys.all, 'list'] as const,
  unread: () => [...noticeKeys.all, 'unread'] as const,
};
