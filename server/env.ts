import { z } from 'zod';

/**
 * The server's configuration, read once from environment variables.
 * Invalid values stop the process at start-up with a message naming the variable.
 */
const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: z.coerce.number().int().positive().default(4000),
  DATABASE_URL: z.string().url().default('postgres://postgres@127.0.0.1:54329/baleproof'),
  SESSION_SECRET: z.string().min(16).default('baleproof-local-dev-session-secret'),
  /** Set to "true" behind HTTPS so cookies get the Secure flag. */
  COOKIE_SECURE: z.enum(['true', 'false']).optional(),
  PUBLIC_URL: z.string().url().default('http://127.0.0.1:4000'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  SMTP_URL: z.string().default('smtp://127.0.0.1:1025'),
  MAIL_FROM: z.string().default('Baleproof <no-reply@baleproof.example>'),
  /** A real key (sk_live_/sk_test_) talks to Stripe; anything else goes to the local fake. */
  STRIPE_SECRET_KEY: z.string().default('sk_test_local_fake'),
  STRIPE_WEBHOOK_SECRET: z.string().default('whsec_local_fake_secret'),
  /** host:port of the local Stripe fake; ignored when STRIPE_API_HOST is unset and the key is real. */
  STRIPE_API_HOST: z.string().optional(),
  STRIPE_FAKE_PORT: z.coerce.number().int().positive().default(12111),
  UPLOAD_DIR: z.string().default('.uploads'),
  ADMIN_EMAIL: z.string().email().default('admin@baleproof.example'),
  ADMIN_PASSWORD: z.string().min(10).default('admin-demo-pass'),
  /** An ISO date-time the server treats as "now" (demos, end-to-end runs); ignored in production. */
  BALEPROOF_FIXED_NOW: z.iso.datetime({ offset: true }).optional(),
  /** How long anonymous catalogue reads and pages may be served from memory; any catalogue change empties it. 0 turns it off. */
  CATALOGUE_CACHE_SECONDS: z.coerce.number().int().min(0).max(300).default(10),
  /** Failed sign-ins per account (e-mail) per 15 minutes. */
  SIGN_IN_RATE_LIMIT: z.coerce.number().int().positive().default(10),
  /** Failed sign-ins per client address per 15 minutes, whatever the accounts tried. */
  SIGN_IN_IP_RATE_LIMIT: z.coerce.number().int().positive().default(30),
  /** Sign-ups per client address per hour (counted whether or not they succeed). */
  SIGN_UP_IP_RATE_LIMIT: z.coerce.number().int().positive().default(20),
  /** Prefix of the rate limiters' counts in PostgreSQL: servers on one database with the same scope share counts. */
  RATE_LIMIT_SCOPE: z.string().max(100).default(''),
});

export type Env = z.infer<typeof EnvSchema>;

/**
 * Secrets whose development defaults are published in the README: production must set its own,
 * or anyone could sign CSRF tokens and sessions, sign in as the admin or forge payment webhooks.
 */
const PUBLIC_DEFAULTS = ['SESSION_SECRET', 'ADMIN_PASSWORD', 'STRIPE_WEBHOOK_SECRET'] as const;

export function readEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = EnvSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  const env = parsed.data;
  if (env.NODE_ENV === 'production') {
    const defaults = EnvSchema.parse({});
    const lines = PUBLIC_DEFAULTS.filter((name) => env[name] === defaults[name]).map((name) => `  ${name}: must be set to a value of your own in production (the default is public)`);
    if (lines.length > 0) throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  return env;
}

export function cookiesAreSecure(env: Env): boolean {
  return env.COOKIE_SECURE ? env.COOKIE_SECURE === 'true' : env.NODE_ENV === 'production';
}
