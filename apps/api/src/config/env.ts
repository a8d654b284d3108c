import { z } from 'zod';

/** Public defaults for local runs; production refuses them (see loadEnv). */
export const DEFAULT_SESSION_SECRET = 'rodewise-local-session-secret-change-me';
export const DEFAULT_WEBHOOK_SECRET = 'whsec_rodewise_local_fake';
/** Shortest secret production accepts: 32 characters (`npm start` generates 43 random base64url characters). */
export const MIN_SECRET_LENGTH = 32;

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
  SESSION_SECRET: z.string().min(16).default(DEFAULT_SESSION_SECRET),
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
  /** Sign-ups per address per hour. */
  SIGNUP_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
  /** Wrong current passwords per member per 15 minutes on the password change form. */
  PASSWORD_CHANGE_RATE_LIMIT: z.coerce.number().int().min(1).default(5),
  /** Buyer and seller messages per member per 10 minutes. */
  MESSAGE_RATE_LIMIT: z.coerce.number().int().min(1).default(30),
  /**
   * Express `trust proxy`: unset (the default) trusts no proxy, so X-Forwarded-For is ignored and rate limits key
   * on the socket address. Behind a reverse proxy set `loopback`, a hop count (`1`) or the proxy's addresses.
   */
  TRUST_PROXY: z.string().optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  WEB_DIST: z.string().optional(),
  UPLOAD_DIR: z.string().optional(),
  /** Where uploads go: `disk` (UPLOAD_DIR, the default) or `s3` (any S3-compatible object storage, S3_* below). */
  STORAGE: z.enum(['disk', 's3']).default('disk'),
  /** Images each member may keep (post images plus listing photos), in MB. */
  IMAGE_QUOTA_MB: z.coerce.number().positive().default(200),
  /** Post images a member may have uploaded but not yet in a saved post. */
  IMAGE_UNUSED_MAX: z.coerce.number().int().min(1).default(40),
  /** Hours an unused post image is kept before the hourly sweep removes it. */
  IMAGE_GRACE_HOURS: z.coerce.number().positive().default(24),
  S3_BUCKET: z.string().min(1).default('rodewise-uploads'),
  S3_REGION: z.string().min(1).default('us-east-1'),
  S3_ENDPOINT: z.url().optional(),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  S3_FORCE_PATH_STYLE: bool.optional(),
  /** When set, every CSP violation report is also appended here as one JSON line (the e2e run reads it). */
  CSP_REPORT_FILE: z.string().optional(),
  STRIPE_SECRET_KEY: z.string().default('sk_test_rodewise_local_fake'),
  STRIPE_WEBHOOK_SECRET: z.string().default(DEFAULT_WEBHOOK_SECRET),
  STRIPE_HOST: z.string().optional(),
  STRIPE_PORT: z.coerce.number().int().optional(),
  STRIPE_PROTOCOL: z.enum(['http', 'https']).optional(),
  /** How long one call to the payment provider may take before it counts as unanswered (the SDK's default is 80 s). */
  STRIPE_TIMEOUT_MS: z.coerce.number().int().min(100).max(120_000).default(20_000),
});

export type Env = Omit<
  z.infer<typeof envSchema>,
  'BCRYPT_COST' | 'COOKIE_SECURE' | 'TRUST_PROXY'
> & {
  BCRYPT_COST: number;
  COOKIE_SECURE: boolean;
  /** The value for Express's `trust proxy` setting. */
  TRUST_PROXY: boolean | number | string;
};

/** `TRUST_PROXY`: unset or `false` → trust nobody; `true`; a hop count; otherwise Express's address list. */
function trustProxy(raw: string | undefined): boolean | number | string {
  const v = raw?.trim();
  if (!v || v === 'false' || v === '0') return false;
  if (v === 'true') return true;
  if (/^\d+$/.test(v)) return Number(v);
  return v;
}

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
  // Anyone can read the defaults in this file: with them a webhook could be forged (dues credited without
  // paying) and digest stop links signed. `npm start` generates both into .data/secrets.json.
  if (e.NODE_ENV === 'production') {
    const weak = (
      [
        ['SESSION_SECRET', e.SESSION_SECRET, DEFAULT_SESSION_SECRET],
        ['STRIPE_WEBHOOK_SECRET', e.STRIPE_WEBHOOK_SECRET, DEFAULT_WEBHOOK_SECRET],
      ] as const
    ).filter(([, value, fallback]) => value === fallback || value.length < MIN_SECRET_LENGTH);
    if (weak.length)
      throw new Error(
        `${weak.map(([name]) => name).join(' and ')} must be set to a random value of at least ${MIN_SECRET_LENGTH} characters in production (not the built-in default)`,
      );
  }
  // A production site served over https gets Secure cookies unless told otherwise; local http runs stay usable.
  const cookieSecure =
    e.COOKIE_SECURE ?? (e.NODE_ENV === 'production' && e.PUBLIC_URL.startsWith('https://'));
  return {
    ...e,
    BCRYPT_COST: cost,
    COOKIE_SECURE: cookieSecure,
    TRUST_PROXY: trustProxy(e.TRUST_PROXY),
  };
}
