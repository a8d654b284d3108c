import { fileURLToPath } from 'node:url';
import { z } from 'zod';

// <repo>/.data is git-ignored.
const DEFAULT_DIR = fileURLToPath(new URL('../../../.data/fake-payments', import.meta.url));

const envSchema = z.object({
  FAKE_PAYMENTS_PORT: z.coerce.number().int().min(0).max(65535).default(4330),
  FAKE_PAYMENTS_DIR: z.string().min(1).default(DEFAULT_DIR),
  FAKE_PAYMENTS_WEBHOOK_URL: z
    .url({ protocol: /^https?$/ })
    .default('http://127.0.0.1:4310/api/payments/webhook'),
  STRIPE_WEBHOOK_SECRET: z.string().startsWith('whsec_').default('whsec_rodewise_local_fake'),
  STRIPE_SECRET_KEY: z
    .string()
    .startsWith('sk_test_', 'the fake only takes test keys')
    .default('sk_test_rodewise_local_fake'),
  FAKE_PAYMENTS_PUBLIC_URL: z.url({ protocol: /^https?$/ }).optional(),
});

export type FakePaymentsEnv = z.infer<typeof envSchema>;

/**
 * Parses the fake-payments settings from `source` (normally process.env).
 * Throws an Error listing every bad variable.
 */
export function parseEnv(source: NodeJS.ProcessEnv): FakePaymentsEnv {
  const result = envSchema.safeParse(source);
  if (result.success) return result.data;
  const lines = result.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
  throw new Error(`Invalid fake-payments environment:\n${lines.join('\n')}`);
}
