import { z } from 'zod';

// Every setting the server reads, parsed once at start-up. Defaults are safe for a laptop:
// loopback services started by `npm start`; production sets its own values.
const boolean = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

const configSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  APP_URL: z.string().url().optional(),
  DATABASE_URL: z.string().url().default('postgres://postgres@127.0.0.1:54329/motifold'),
  SESSION_SECRET: z.string().min(16, 'SESSION_SECRET must be at least 16 characters').optional(),
  S3_ENDPOINT: z.string().url().optional(),
  S3_BUCKET: z.string().min(3).default('motifold'),
  S3_REGION: z.string().default('us-east-1'),
  S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
  S3_FORCE_PATH_STYLE: boolean.default(true),
  SMTP_URL: z.string().url().default('smtp://127.0.0.1:1025'),
  MAIL_FROM: z.string().default('Motifold <no-reply@motifold.test>'),
  MAIL_INBOX_URL: z.string().url().optional(),
  STORAGE_DIR: z.string().default('./storage'),
  RUN_WORKER_IN_PROCESS: boolean.default(true),
  IMPORT_CONCURRENCY: z.coerce.number().int().min(1).max(16).default(1),
  // Threads that share a print file's drawing with the export job's own (0: draw on it alone);
  // unset, one per core beyond the first, at most 3.
  PRINT_DRAW_THREADS: z.coerce.number().int().min(0).max(16).optional(),
  // 1 GiB: the largest layered file a studio is likely to keep (issue's default).
  UPLOAD_LIMIT_BYTES: z.coerce.number().int().min(1024).default(1024 * 1024 * 1024),
  // 40 MiB: above a full-size phone photo (HEIC/JPEG of 48 MP is about 10–25 MB).
  SAMPLE_PHOTO_LIMIT_BYTES: z.coerce.number().int().min(1024).default(40 * 1024 * 1024),
  // decoded pixels a sample photo may have (decompression-bomb guard); 120 MP covers phone cameras
  SAMPLE_PHOTO_MAX_PIXELS: z.coerce.number().int().min(1).default(120_000_000),
  JSON_LIMIT_BYTES: z.coerce.number().int().min(1024).default(1024 * 1024),
  RATE_LIMIT_WINDOW_MS: z.coerce.number().int().min(1000).default(15 * 60 * 1000),
  RATE_LIMIT_SIGN_IN: z.coerce.number().int().min(1).default(10),
  RATE_LIMIT_SIGN_UP: z.coerce.number().int().min(1).default(10),
  RATE_LIMIT_RESET: z.coerce.number().int().min(1).default(5),
  RESET_TOKEN_TTL_MINUTES: z.coerce.number().int().min(1).default(60),
  INVITATION_TTL_DAYS: z.coerce.number().int().min(1).default(14),
});

export type AppConfig = z.infer<typeof configSchema> & { appUrl: string; sessionSecret: string };

export function parseConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = configSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Motifold cannot start: bad configuration\n${lines.join('\n')}`);
  }
  const c = parsed.data;
  if (c.NODE_ENV === 'production' && !c.SESSION_SECRET) {
    throw new Error('Motifold cannot start: SESSION_SECRET is required in production');
  }
  return {
    ...c,
    appUrl: c.APP_URL ?? `http://127.0.0.1:${c.PORT}`,
    // A fixed local secret only outside production, so dev sessions survive restarts.
    sessionSecret: c.SESSION_SECRET ?? 'motifold-local-development-secret',
  };
}

let cached: AppConfig | undefined;
export function getConfig(): AppConfig {
  cached ??= parseConfig();
  return cached;
}
