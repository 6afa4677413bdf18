import { z } from 'zod';

const bool = z
  .enum(['true', 'false', '1', '0'])
  .transform((v) => v === 'true' || v === '1');

/**
 * Every setting the server reads, validated once at start. Defaults are safe for one machine:
 * bound to loopback, mail and files to the local fakes that `npm start` runs.
 */
export const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(8080),
  PUBLIC_URL: z.url().optional(),
  TRUST_PROXY: z.string().default('false'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  STATIC_DIR: z.string().optional(),

  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().default(3307),
  DB_NAME: z.string().default('tracewright'),
  DB_USER: z.string().default('tw_app'),
  DB_PASSWORD: z.string().min(1, 'DB_PASSWORD is required (npm start generates one into .data/secrets.json).'),
  DB_OWNER_USER: z.string().default('tw_owner'),
  DB_OWNER_PASSWORD: z.string().optional(),
  DB_POOL_MAX: z.coerce.number().int().min(1).max(100).default(20),

  JWT_SECRET: z.string().min(32, 'JWT_SECRET must be at least 32 characters.'),
  SESSION_HOURS: z.coerce.number().min(0.01).max(24 * 30).default(12),

  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().default(2525),
  SMTP_SECURE: bool.default(false),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().default('Tracewright <tracewright@lab.example>'),
  /** Folder where the local SMTP fake stores captured mails; set only in development and tests. */
  MAIL_CAPTURE_DIR: z.string().optional(),

  S3_ENDPOINT: z.string().optional(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().default('tracewright-files'),
  S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
  S3_FORCE_PATH_STYLE: bool.default(true),

  SIGN_IN_LIMIT: z.coerce.number().int().min(1).default(10),
  SIGN_IN_WINDOW_MINUTES: z.coerce.number().min(0.01).default(15),
  PIN_LIMIT: z.coerce.number().int().min(1).default(5),
});

export type Env = z.infer<typeof EnvSchema> & { PUBLIC_URL: string };

export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = EnvSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n');
    throw new Error(`Settings are not valid:\n${lines}`);
  }
  const env = parsed.data;
  return { ...env, PUBLIC_URL: (env.PUBLIC_URL ?? `http://localhost:${env.PORT}`).replace(/\/$/, '') };
}
