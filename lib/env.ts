/**
 * The environment, read once and validated with zod. Every variable has a local default so a
 * fresh clone runs with no configuration; production sets DATABASE_URL, BETTER_AUTH_SECRET,
 * APP_URL and SMTP_URL.
 */
import path from 'node:path';
import { z } from 'zod';
import { resolveAuthSecret } from './auth-secret';
import { listensOnLoopbackOnly } from './listen-host';

const schema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  /** Signs session cookies and tokens; unset means a random one kept in AUTH_SECRET_FILE (lib/auth-secret.ts). */
  BETTER_AUTH_SECRET: z.string().optional(),
  AUTH_SECRET_FILE: z.string().default('.data/auth-secret'),
  /** Addresses or CIDR ranges of reverse proxies whose X-Forwarded-For is believed (lib/client-address.ts). */
  TRUSTED_PROXIES: z.string().optional(),
  /** The public URL of the app, used in e-mailed links. */
  APP_URL: z.string().url().default('http://127.0.0.1:3000'),
  /** A real SMTP server; unset means the local sink of scripts/mail-sink.ts. */
  SMTP_URL: z.string().optional(),
  MAIL_SINK_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  MAIL_SINK_DIR: z.string().default('.data/mail'),
  MAIL_FROM: z.string().default('Leeway <no-reply@leeway.local>'),
});

export type Env = z.infer<typeof schema>;

export const env: Env = schema.parse(process.env);

/** The database URL: DATABASE_URL, or the project-local cluster (db/url.ts). */
export { databaseUrl } from '@/db/url';

/** True when mail goes to the local sink (the local inbox is then possible: lib/inbox-access.ts). */
export function usesMailSink(): boolean {
  return !env.SMTP_URL;
}

let secret: string | undefined;

/** The auth secret, generated and kept on first use when none is configured; throws on an unsafe one. */
export function authSecret(): string {
  secret ??= resolveAuthSecret({
    configured: env.BETTER_AUTH_SECRET,
    file: path.resolve(/*turbopackIgnore: true*/ process.cwd(), env.AUTH_SECRET_FILE),
    loopbackOnly: listensOnLoopbackOnly(),
  });
  return secret;
}
