// Environment, parsed once with zod. Every variable is documented in README.md § Configuration.
import os from 'node:os';
import { z } from 'zod';

const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(1).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  DATABASE_URL: z.string().optional(),
  SESSION_SECRET: z.string().min(16).optional(),
  SMTP_URL: z.string().optional(),
  MAIL_FROM: z.string().default('Panelwright <no-reply@panelwright.local>'),
  PW_SMTP_FAKE_PORT: z.coerce.number().int().default(2525),
  PW_SIGNIN_LIMIT: z.coerce.number().int().min(1).default(10),
  PW_LOG_SQL: z.enum(['0', '1']).default('0'),
  /** default: the address the server listens on (HOST and PORT) */
  APP_URL: z.string().optional(),
});

export type Env = Omit<z.infer<typeof EnvSchema>, 'APP_URL'> & { APP_URL: string };

/**
 * http://HOST:PORT as a browser would open it: a wildcard address (0.0.0.0, ::) stands for every
 * interface, so the machine's host name is given instead; an IPv6 address is bracketed.
 */
export function listenUrl(host: string, port: number): string {
  const name = host === '0.0.0.0' || host === '::' || host === '' ? os.hostname() : host.includes(':') ? `[${host}]` : host;
  return `http://${name}:${port}`;
}

let cached: Env | null = null;

export function env(): Env {
  if (!cached) {
    const parsed = EnvSchema.parse(process.env);
    cached = { ...parsed, APP_URL: parsed.APP_URL || listenUrl(parsed.HOST, parsed.PORT) };
  }
  return cached;
}

/** For tests that change variables between app instances. */
export function resetEnvCache() {
  cached = null;
}
