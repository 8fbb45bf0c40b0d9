// Every setting the app reads, validated in one place. `instrumentation.ts` calls `env()` when a
// server starts, so a missing or malformed setting stops the start with a clear message instead of
// failing on the first request that needs it. scripts/env.sh sets local defaults for all of them.
import { z } from 'zod';

const secret = (min: number, name: string) =>
  z.string().min(min, `${name} must be at least ${min} characters (scripts/env.sh generates one locally)`);

const flag = z
  .enum(['0', '1', ''])
  .optional()
  .transform((v) => v === '1');

const schema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  APP_URL: z
    .url('APP_URL must be an absolute http(s) URL')
    .default('http://localhost:3000')
    .transform((u) => u.replace(/\/+$/, '')),
  SESSION_SECRET: secret(32, 'SESSION_SECRET').optional(),
  LABEL_SECRET: secret(32, 'LABEL_SECRET').optional(),
  RECEIPT_SECRET: secret(16, 'RECEIPT_SECRET').optional(),
  CASE_LINK_SECRET: secret(16, 'CASE_LINK_SECRET').optional(),
  CHAIN_KEY: secret(32, 'CHAIN_KEY').optional(),
  HM_INSECURE_COOKIES: flag,
  S3_ENDPOINT: z.url().optional(),
  S3_PUBLIC_ENDPOINT: z.url().optional(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().min(3).default('hitchmark-photos'),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  SMTP_SECURE: flag,
  MAIL_FROM: z.string().default('Hitchmark <no-reply@hitchmark.example>'),
  /** The job worker's own connection, past a transaction-pooling PgBouncer (db/url.ts). */
  DATABASE_SESSION_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, 'DATABASE_SESSION_URL must be a postgres:// URL')
    .optional(),
  /** '0': this server runs no job worker (e-mail, cleanup, anchors); another process must. */
  HM_JOB_WORKER: z.enum(['0', '1']).default('1'),
  /** The job worker's fixed id (default: host name and port); one live server per id. */
  HM_JOB_WORKER_ID: z
    .string()
    .regex(/^[\w.-]{1,100}$/, 'HM_JOB_WORKER_ID: letters, digits, dot, dash, underscore')
    .optional(),
  /** The port `next start` listens on (the framework sets it). */
  PORT: z.coerce.number().int().min(1).max(65535).optional(),
});

export type Env = z.infer<typeof schema>;

let cached: Env | null = null;

/** The validated settings, read from process.env once. Throws naming every bad variable. */
export function env(): Env {
  if (cached) return cached;
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Hitchmark settings are not valid:\n${lines.join('\n')}`);
  }
  const value = parsed.data;
  if (value.NODE_ENV === 'production') {
    const missing = (['SESSION_SECRET', 'CHAIN_KEY'] as const).filter((k) => !value[k]);
    if (missing.length)
      throw new Error(
        `Hitchmark settings are not valid:\n${missing.map((k) => `  ${k} must be set in production`).join('\n')}`,
      );
  }
  cached = value;
  return value;
}

/** Tests that change process.env call this so the next `env()` reads it again. */
export function reloadEnv(): void {
  cached = null;
}

/** The public address of the app, without a trailing slash (labels, e-mails, links). */
export function appUrl(): string {
  return env().APP_URL;
}

function required(value: string | undefined, name: string): string {
  if (!value) throw new Error(`${name} is not set. scripts/env.sh sets it locally; production must set it.`);
  return value;
}

export const labelSecret = () => required(env().LABEL_SECRET, 'LABEL_SECRET');
export const receiptSecret = () => required(env().RECEIPT_SECRET, 'RECEIPT_SECRET');
/** The HMAC key of the handoff hash chain. Lives outside the database; losing it means old links can no longer be checked. */
export const chainKey = () => required(env().CHAIN_KEY, 'CHAIN_KEY');
/** Signed case links: CASE_LINK_SECRET when set, else RECEIPT_SECRET. */
export const caseLinkSecret = () =>
  required(env().CASE_LINK_SECRET ?? env().RECEIPT_SECRET, 'CASE_LINK_SECRET or RECEIPT_SECRET');
