import { z } from 'zod';

const bool = z.enum(['0', '1', 'true', 'false']).transform((v) => v === '1' || v === 'true');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(4310),
  PUBLIC_URL: z.url().default('http://127.0.0.1:4310'),
  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().default(3307),
  DB_NAME: z.string().min(1).default('rodewise'),
  DB_USER: z.string().min(1).default('rodewise'),
  DB_PASSWORD: z.string().default('rodewise-local-only'),
  DB_POOL_MAX: z.coerce.number().int().min(1).default(20),
  SESSION_SECRET: z.string().min(16).default('rodewise-local-session-secret-change-me'),
  SESSION_MAX_AGE_H: z.coerce
    .number()
    .positive()
    .default(24 * 14),
  /** Secure cookies, HSTS and upgrade-insecure-requests; defaults on in production behind an https PUBLIC_URL. */
  COOKIE_SECURE: bool.optional(),
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).optional(),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().default(4325),
  MAIL_FROM: z.string().default('Rodewise <no-reply@rodewise.invalid>'),
  MAIL_INBOX_URL: z.string().default('http://127.0.0.1:4326'),
  OUTBOX_INTERVAL_MS: z.coerce.number().int().min(0).default(1000),
  LOGIN_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
  RESET_RATE_LIMIT: z.coerce.number().int().min(1).default(5),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  WEB_DIST: z.string().optional(),
  UPLOAD_DIR: z.string().optional(),
  /** When set, every CSP violation report is also appended here as one JSON line (the e2e run reads it). */
  CSP_REPORT_FILE: z.string().optional(),
  STRIPE_SECRET_KEY: z.string().default('sk_test_rodewise_local_fake'),
  STRIPE_WEBHOOK_SECRET: z.string().default('whsec_rodewise_local_fake'),
  STRIPE_HOST: z.string().optional(),
  STRIPE_PORT: z.coerce.number().int().optional(),
  STRIPE_PROTOCOL: z.enum(['http', 'https']).optional(),
  /** How long one call to the payment provider may take before it counts as unanswered (the SDK's default is 80 s). */
  STRIPE_TIMEOUT_MS: z.coerce.number().int().min(100).max(120_000).default(20_000),
});

export type Env = Omit<z.infer<typeof envSchema>, 'BCRYPT_COST' | 'COOKIE_SECURE'> & {
  BCRYPT_COST: number;
  COOKIE_SECURE: boolean;
};

/** Parses process.env once; a bad variable stops boot with a list of what is wrong. */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  // Production cost is at least 12 (OWASP password storage guidance); tests use the minimum to stay fast.
  const cost = e.BCRYPT_COST ?? (e.NODE_ENV === 'test' ? 4 : 12);
  if (e.NODE_ENV === 'production' && cost < 12)
    throw new Error('BCRYPT_COST must be at least 12 in production');
  // A production site served over https gets Secure cookies unless told otherwise; local http runs stay usable.
  const cookieSecure =
    e.COOKIE_SECURE ?? (e.NODE_ENV === 'production' && e.PUBLIC_URL.startsWith('https://'));
  return { ...e, BCRYPT_COST: cost, COOKIE_SECURE: cookieSecure };
}
