import { z } from 'zod';

// Checked once at start: a wrong or missing variable stops the process with a clear message.
const bool = z
  .enum(['true', 'false', '1', '0', ''])
  .optional()
  .transform((v) => v === 'true' || v === '1');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  APP_ORIGIN: z.string().url().default('http://localhost:3000'),
  /** Extra origins allowed for state-changing requests (comma separated), e.g. the Vite dev server. */
  EXTRA_ORIGINS: z.string().default(''),
  DATABASE_URL: z.string().min(1, 'DATABASE_URL is required (npm start sets it for the local cluster)'),
  DATABASE_POOL_MAX: z.coerce.number().int().min(1).max(200).default(20),
  SESSION_SECRET: z.string().min(16).default('drabyard-local-session-secret-change-me'),
  TRUST_PROXY: bool,
  SMTP_URL: z.string().default('smtp://127.0.0.1:2525'),
  MAIL_FROM: z.string().default('Drabyard <no-reply@drabyard.test>'),
  STRIPE_SECRET_KEY: z.string().default('sk_test_drabyard_local'),
  STRIPE_WEBHOOK_SECRET: z.string().default('whsec_drabyard_local'),
  STRIPE_API_HOST: z.string().optional(),
  STRIPE_API_PORT: z.coerce.number().int().optional(),
  STRIPE_API_PROTOCOL: z.enum(['http', 'https']).optional(),
  /** How long stock is held for an unpaid checkout; Stripe accepts 30 minutes to 24 hours for a session. */
  CHECKOUT_HOLD_MINUTES: z.coerce.number().int().min(30).max(1440).default(30),
  /** How often the sweeper releases stock of expired checkouts and retries unpaid transfers; 0 turns it off. */
  STOCK_SWEEP_SECONDS: z.coerce.number().int().min(0).default(60),
  // How many processes serve HTTP (node:cluster); background jobs run once, in the primary process.
  // Identical searches within this many seconds share one answer (0: every search runs; the search benchmark
  // uses 0 to measure the engine itself).
  SEARCH_CACHE_SECONDS: z.coerce.number().int().min(0).max(3600).default(10),
  WEB_CONCURRENCY: z.coerce.number().int().min(1).max(64).default(1),
  MEDIA_DIR: z.string().default('.data/media'),
  S3_BUCKET: z.string().optional(),
  S3_ENDPOINT: z.string().optional(),
  S3_REGION: z.string().optional(),
  S3_FORCE_PATH_STYLE: z.string().optional(),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  S3_PUBLIC_BASE_URL: z.string().optional(),
  S3_KEY_PREFIX: z.string().optional(),
  /** URL prefix the local photo folder is served under (local storage only). */
  MEDIA_URL_BASE: z.string().default('/media'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  CLIENT_DIST: z.string().default('dist/client'),
  LOGIN_MAX_FAILURES: z.coerce.number().int().min(1).default(5),
  LOGIN_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
  LOGIN_MAX_FAILURES_PER_IP: z.coerce.number().int().min(1).default(50),
});

export type Env = z.infer<typeof envSchema>;

export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n');
    throw new Error(`Invalid environment:\n${lines}`);
  }
  if (parsed.data.NODE_ENV === 'production' && parsed.data.SESSION_SECRET.startsWith('drabyard-local')) {
    throw new Error('Invalid environment:\n  SESSION_SECRET: set a real secret in production');
  }
  return parsed.data;
}

let cached: Env | undefined;
export function env(): Env {
  cached ??= loadEnv();
  return cached;
}
