export const SECRETS_FILE: string;
export function ensureSecrets(
  file?: string,
  env?: Record<string, string | undefined>,
): { SESSION_SECRET: string; STRIPE_WEBHOOK_SECRET: string };
export function freshSecrets(): { SESSION_SECRET: string; STRIPE_WEBHOOK_SECRET: string };
