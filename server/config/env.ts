import { dirname, join } from 'node:path';
import { z } from 'zod';

/** Environment the server reads at boot; anything invalid stops it with a readable message. */
const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  DILUTRACE_DB: z.string().min(1).default('data/dilutrace.sqlite'),
  DILUTRACE_SESSION_SECRET: z.string().min(32, 'DILUTRACE_SESSION_SECRET must be at least 32 characters').optional(),
  DILUTRACE_PUBLIC_URL: z.url().optional(),
  DILUTRACE_SEED_DEMO: z.enum(['0', '1']).default('1'),
  DILUTRACE_DEMO_PASSWORD: z.string().min(10, 'DILUTRACE_DEMO_PASSWORD must be at least 10 characters').default('wellmere-demo-2026'),
  DILUTRACE_TRUST_PROXY: z.enum(['0', '1']).default('0'),
  /** Sign-in attempts allowed per address and e-mail in 15 minutes (raise only for load tests). */
  DILUTRACE_SIGNIN_LIMIT: z.coerce.number().int().min(1).default(10),
  SMTP_URL: z.url().optional(),
  MAIL_FROM: z.string().default('Dilutrace <no-reply@dilutrace.local>'),
});

export type Env = z.infer<typeof envSchema>;

export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Dilutrace cannot start, the environment is invalid:\n${lines.join('\n')}`);
  }
  return parsed.data;
}

/** Uploaded certificates live beside the database file, outside the web root. */
export const certificateDir = (databaseFile: string) => join(dirname(databaseFile), 'certificates');
