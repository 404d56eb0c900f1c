// Environment, parsed once with zod. Every variable is documented in README.md § Configuration.
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
  APP_URL: z.string().default('http://127.0.0.1:3000'),
});

export type Env = z.infer<typeof EnvSchema>;

let cached: Env | null = null;

export function env(): Env {
  if (!cached) cached = EnvSchema.parse(process.env);
  return cached;
}

/** For tests that change variables between app instances. */
export function resetEnvCache() {
  cached = null;
}
