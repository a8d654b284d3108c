import { fileURLToPath } from 'node:url';
import { z } from 'zod';

// <repo>/.data is git-ignored.
const DEFAULT_DIR = fileURLToPath(new URL('../../../.data/fake-mail', import.meta.url));

const port = (fallback: number) => z.coerce.number().int().min(0).max(65535).default(fallback);

const envSchema = z.object({
  FAKE_MAIL_SMTP_PORT: port(4325),
  FAKE_MAIL_HTTP_PORT: port(4326),
  FAKE_MAIL_DIR: z.string().min(1).default(DEFAULT_DIR),
});

export type FakeMailEnv = z.infer<typeof envSchema>;

/**
 * Parses the fake-mail settings from `source` (normally process.env).
 * Throws an Error listing every bad variable.
 */
export function parseEnv(source: NodeJS.ProcessEnv): FakeMailEnv {
  const result = envSchema.safeParse(source);
  if (result.success) return result.data;
  const lines = result.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
  throw new Error(`Invalid fake-mail environment:\n${lines.join('\n')}`);
}
