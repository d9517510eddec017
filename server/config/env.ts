import { availableParallelism } from 'node:os';
import { z } from 'zod';

const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
    HOST: z.string().default('127.0.0.1'),
    PORT: z.coerce.number().int().min(0).max(65535).default(3000),
    DATABASE_URL: z.string().url({ message: 'DATABASE_URL must be a postgres:// URL' }),
    SESSION_SECRET: z.string().min(32).optional(),
    RFOLIO_DEMO_PASSWORD: z.string().min(12).default('rfolio-demo-2026'),
    RFOLIO_SEED_DEMO: z.enum(['0', '1']).optional(),
    APP_URL: z.string().url().optional(),
    SMTP_HOST: z.string().optional(),
    SMTP_PORT: z.coerce.number().int().optional(),
    SMTP_USER: z.string().optional(),
    SMTP_PASSWORD: z.string().optional(),
    SMTP_SECURE: z.enum(['0', '1']).optional(),
    /** Port of the local mail catcher (development, demo, tests); 0 picks a free one. */
    MAIL_CATCHER_PORT: z.coerce.number().int().min(0).max(65535).default(0),
    MAIL_FROM: z.string().default('Rfolio <no-reply@rfolio.invalid>'),
    /** Wrong current passwords (profile) per user and reset requests per address within the window, before 429. */
    SIGNIN_MAX_FAILURES_PER_ACCOUNT: z.coerce.number().int().min(1).default(10),
    SIGNIN_MAX_FAILURES_PER_ADDRESS: z.coerce.number().int().min(1).default(50),
    SIGNIN_WINDOW_MINUTES: z.coerce.number().positive().default(15),
    /** Failed sign-ins per e-mail and per address with no wait; each later one doubles the wait (1 s, 2 s, 4 s …). */
    SIGNIN_FREE_FAILURES_PER_ACCOUNT: z.coerce.number().int().min(1).max(100).default(5),
    SIGNIN_FREE_FAILURES_PER_ADDRESS: z.coerce.number().int().min(1).max(1000).default(20),
    /** The longest wait a run of failed sign-ins imposes, in seconds. */
    SIGNIN_MAX_WAIT_SECONDS: z.coerce.number().positive().max(3600).default(30),
    /** Proxies whose X-Forwarded-For is believed (Express "trust proxy": addresses, CIDRs, loopback…); none by default. */
    TRUST_PROXY: z.string().trim().optional(),
    /** Where throttle counters live; default postgres in production, memory elsewhere. */
    SIGNIN_THROTTLE_STORE: z.enum(['memory', 'postgres']).optional(),
    /** App processes serving the port (node:cluster); default one per core in production, 1 elsewhere. */
    RFOLIO_WORKERS: z.coerce.number().int().min(1).max(64).optional(),
    LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
    RFOLIO_PG_BIN: z.string().optional(),
    RFOLIO_PGDATA: z.string().optional(),
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV === 'production' && !env.SESSION_SECRET) {
      ctx.addIssue({ code: 'custom', path: ['SESSION_SECRET'], message: 'required in production (≥ 32 characters)' });
    }
    if (env.NODE_ENV === 'production' && env.RFOLIO_SEED_DEMO === '1') {
      ctx.addIssue({
        code: 'custom',
        path: ['RFOLIO_SEED_DEMO'],
        message: 'refused in production: the demo accounts have a published password',
      });
    }
    if ((env.RFOLIO_WORKERS ?? 1) > 1 && env.NODE_ENV !== 'production') {
      ctx.addIssue({
        code: 'custom',
        path: ['RFOLIO_WORKERS'],
        message: 'above 1 only in production: elsewhere the local mail catcher keeps its messages in one process',
      });
    }
    if ((env.RFOLIO_WORKERS ?? 1) > 1 && env.SIGNIN_THROTTLE_STORE === 'memory') {
      ctx.addIssue({
        code: 'custom',
        path: ['SIGNIN_THROTTLE_STORE'],
        message: 'memory counts per process; use postgres with RFOLIO_WORKERS above 1',
      });
    }
  });

export type Env = z.infer<typeof envSchema> & {
  /** Demo mode: the invented group's accounts and records are seeded, and the local mail catcher runs. */
  demo: boolean;
  sessionSecret: string;
  appUrl: string;
  /** App processes to run (RFOLIO_WORKERS, or one per core in production). */
  workers: number;
};

/** Parses the environment once at start; exits with a clear message when it is unusable. */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.') || 'env'}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  const env = parsed.data;
  const production = env.NODE_ENV === 'production';
  return {
    ...env,
    demo: !production && env.NODE_ENV !== 'test' ? true : env.RFOLIO_SEED_DEMO === '1',
    sessionSecret: env.SESSION_SECRET ?? 'rfolio-development-only-secret-not-for-production',
    appUrl: env.APP_URL ?? `http://${env.HOST}:${env.PORT}`,
    workers: env.RFOLIO_WORKERS ?? (production ? availableParallelism() : 1),
  };
}

/**
 * Express's "trust proxy" value for TRUST_PROXY: unset, empty, "0" or "false" trusts no one (the socket's address
 * is the client's); a hop count ("1") or a comma-separated list of addresses, CIDRs and Express's names
 * (loopback, linklocal, uniquelocal) trusts those proxies only.
 */
export function trustProxySetting(value: string | undefined): boolean | number | string[] {
  const text = value?.trim() ?? '';
  if (text === '' || text === '0' || text.toLowerCase() === 'false') return false;
  if (/^\d+$/.test(text)) return Number(text);
  return text
    .split(',')
    .map((part) => part.trim())
    .filter(Boolean);
}

let cached: Env | undefined;
export function env(): Env {
  cached ??= loadEnv();
  return cached;
}
