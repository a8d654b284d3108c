/** Query keys for the auth resource (the session and the signed-in person). */
export const authKeys = {
  all: ['auth'] as const,
  session: () => [...authKeys.all, 'session'] as const,
};
