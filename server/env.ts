import { z } from 'zod';

/** Every setting the server reads, parsed once at start-up; nothing else reads process.env. */
const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(1).max(65535).default(8080),
  DATABASE_URL: z.string().url('must be a postgres:// URL'),
  APP_URL: z.string().url().optional(),
  JWT_SECRET: z.string().min(32, 'must be at least 32 characters'),
  SESSION_MINUTES: z.coerce
    .number()
    .int()
    .min(1)
    .max(24 * 60)
    .default(30),
  SIGNIN_RATE_MAX: z.coerce.number().int().min(1).default(10),
  SIGNIN_RATE_WINDOW_MIN: z.coerce.number().int().min(1).default(15),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(54330),
  SMTP_SECURE: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().default('Porelith <no-reply@porelith.example>'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  PORELITH_DIST: z.string().default('dist'),
  // Demo accounts carry a published password, so a production install must ask for them explicitly.
  PORELITH_DEMO: z.enum(['0', '1'], { error: 'must be 0 or 1' }).optional(),
});

export type Env = Omit<z.infer<typeof envSchema>, 'PORELITH_DEMO'> & {
  APP_URL: string;
  /** Seed (and keep re-creating) the demo team and accounts at set-up: PORELITH_DEMO, else on outside production. */
  PORELITH_DEMO: boolean;
};

/**
 * Parses the environment; throws with every invalid field named.
 * @example parseEnv({ DATABASE_URL: 'postgres://u@127.0.0.1:54329/db', JWT_SECRET: 'x'.repeat(32) }).PORT // 8080
 */
export function parseEnv(source: Record<string, string | undefined>): Env {
  const result = envSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join('.') || '(root)'}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  const env = result.data;
  return {
    ...env,
    APP_URL: env.APP_URL ?? `http://${env.HOST}:${env.PORT}`,
    PORELITH_DEMO: env.PORELITH_DEMO === undefined ? env.NODE_ENV !== 'production' : env.PORELITH_DEMO === '1',
  };
}

/** For entry points: parse process.env or exit with a readable message. */
export function loadEnvOrExit(): Env {
  try {
    return parseEnv(process.env);
  } catch (err) {
    console.error((err as Error).message);
    process.exit(78); // EX_CONFIG
  }
}
