/** Query keys for the member's dues. */
export const duesKeys = {
  all: ['dues'] as const,
  me: () => [...duesKeys.all, 'me'] as const,
  checkout: (sessionId: string) => [...duesKeys.all, 'checkout', sessionId] as const,
};
