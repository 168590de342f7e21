import path from 'node:path';
import { Cron } from 'croner';
import { z } from 'zod';

const optionalText = z.preprocess((v) => (v === '' ? undefined : v), z.string().optional());

function isCronPattern(pattern: string): boolean {
  try {
    new Cron(pattern, { paused: true }).stop();
    return true;
  } catch {
    return false;
  }
}

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(1).max(65535).default(3000),
  HOST: z.string().default('0.0.0.0'),
  DATABASE_URL: z
    .preprocess((v) => (v === '' ? undefined : v), z.string().optional())
    .pipe(z.string()
    .regex(/^postgres(ql)?:\/\//, 'DATABASE_URL must be a postgres:// URL; leave it unset for SQLite')
    .optional()),
  DATABASE_PATH: z.string().default(path.join('data', 'boothwright.sqlite')),
  SESSION_SECRET: z.string().min(16, 'SESSION_SECRET must be at least 16 characters').optional(),
  TRUST_PROXY: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
  SLOW_REQUEST_MS: z.coerce.number().int().min(1).default(1000),
  RESPONSE_CACHE_MB: z.coerce.number().min(0).max(1024).default(24),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  UPLOAD_DIR: z.string().default(path.join('data', 'uploads')),
  LOGIN_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
  LOGIN_ACCOUNT_RATE_LIMIT: z.coerce.number().int().min(1).default(5),
  LIVE_STREAMS_PER_USER: z.coerce.number().int().min(1).default(10),
  LIVE_STREAMS_PER_SERVER: z.coerce.number().int().min(1).default(1000),
  SMTP_URL: z.preprocess((v) => (v === '' ? undefined : v), z.string().regex(/^smtps?:\/\//, 'SMTP_URL must start with smtp:// or smtps://').optional()),
  MAIL_FROM: z.string().default('Boothwright <boothwright@localhost>'),
  FAKE_SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(2525),
  RECOAT_WARNING_HOURS: z.coerce.number().min(0.25).max(48).default(2),
  PUBLIC_URL: optionalText.pipe(z.url('PUBLIC_URL must be the address people open Boothwright at, such as https://finish.example.com').optional()),
  CLIENT_DIR: z.string().default(path.join('dist', 'client')),
  NOTIFICATION_SCHEDULE: z.string().default('0 * * * * *').refine(isCronPattern, 'NOTIFICATION_SCHEDULE must be a cron pattern, e.g. "0 * * * * *" (each minute)'),
  S3_BUCKET: optionalText,
  S3_ENDPOINT: optionalText.pipe(z.url('S3_ENDPOINT must be a URL such as http://127.0.0.1:4568').optional()),
  S3_REGION: z.string().default('us-east-1'),
  S3_ACCESS_KEY_ID: optionalText,
  S3_SECRET_ACCESS_KEY: optionalText,
  S3_FORCE_PATH_STYLE: z
    .enum(['true', 'false'])
    .default('true')
    .transform((v) => v === 'true'),
}).refine((env) => !env.S3_ACCESS_KEY_ID === !env.S3_SECRET_ACCESS_KEY, { path: ['S3_SECRET_ACCESS_KEY'], message: 'Set both S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY, or neither (the AWS SDK then finds credentials itself)' });

export type DatabaseConfig = { kind: 'sqlite'; path: string } | { kind: 'postgres'; url: string };

/** An S3-compatible bucket for uploads, shared by every instance; unset means the local UPLOAD_DIR. */
export interface S3Config {
  bucket: string;
  /** Unset: AWS itself. Set for any other S3-compatible store (or the local fake). */
  endpoint: string | undefined;
  region: string;
  credentials: { accessKeyId: string; secretAccessKey: string } | undefined;
  forcePathStyle: boolean;
}

export interface AppConfig {
  env: 'development' | 'production' | 'test';
  port: number;
  host: string;
  database: DatabaseConfig;
  /** Unset means: use (or create) a random secret kept beside the data, see session-secret.ts. */
  signInSecret: string | undefined;
  /** Cookies get `secure` when the app sits behind an HTTPS proxy. */
  trustProxy: boolean;
  logLevel: string;
  /** Requests are logged only when they fail (5xx) or take at least this long. */
  slowRequestMs: number;
  /** Bytes of answers the response cache may hold (0 turns it off). */
  responseCacheBytes: number;
  uploadDir: string;
  loginRateLimit: number;
  /** Failed sign-ins to one account (whatever the address) before it waits a few minutes. */
  loginAccountRateLimit: number;
  /** Open live-update streams (GET /api/events) one user, and this whole server, may hold. */
  liveStreams: { perUser: number; perServer: number };
  /** Unset: the app starts its own fake SMTP server on FAKE_SMTP_PORT (0 = any free port). */
  smtpUrl: string | undefined;
  mailFrom: string;
  fakeSmtpPort: number;
  recoatWarningHours: number;
  /** The address people open the app at, for links in e-mails (no trailing slash). */
  publicUrl: string;
  /** The built client to serve. */
  clientDir: string;
  /** When the notification scheduler ticks (croner pattern with seconds). */
  notificationSchedule: string;
  s3: S3Config | undefined;
}

export function parseConfig(source: NodeJS.ProcessEnv): AppConfig {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `- ${i.path.join('.')}: ${i.message}`).join('\n');
    throw new Error(`Configuration is not valid:\n${problems}`);
  }
  const env = parsed.data;
  return {
    env: env.NODE_ENV,
    port: env.PORT,
    host: env.HOST,
    database: env.DATABASE_URL ? { kind: 'postgres', url: env.DATABASE_URL } : { kind: 'sqlite', path: env.DATABASE_PATH },
    signInSecret: env.SESSION_SECRET,
    trustProxy: env.TRUST_PROXY,
    logLevel: env.LOG_LEVEL,
    slowRequestMs: env.SLOW_REQUEST_MS,
    responseCacheBytes: Math.round(env.RESPONSE_CACHE_MB * 1024 * 1024),
    uploadDir: env.UPLOAD_DIR,
    loginRateLimit: env.LOGIN_RATE_LIMIT,
    loginAccountRateLimit: env.LOGIN_ACCOUNT_RATE_LIMIT,
    liveStreams: { perUser: env.LIVE_STREAMS_PER_USER, perServer: env.LIVE_STREAMS_PER_SERVER },
    smtpUrl: env.SMTP_URL,
    mailFrom: env.MAIL_FROM,
    fakeSmtpPort: env.FAKE_SMTP_PORT,
    recoatWarningHours: env.RECOAT_WARNING_HOURS,
    publicUrl: (env.PUBLIC_URL ?? `http://localhost:${env.PORT}`).replace(/\/+$/, ''),
    clientDir: env.CLIENT_DIR,
    notificationSchedule: env.NOTIFICATION_SCHEDULE,
    s3: s3Config(env),
  };
}

function s3Config(env: z.infer<typeof envSchema>): S3Config | undefined {
  if (!env.S3_BUCKET) return undefined;
  const credentials = env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY ? { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY } : undefined;
  return { bucket: env.S3_BUCKET, endpoint: env.S3_ENDPOINT, region: env.S3_REGION, credentials, forcePathStyle: env.S3_FORCE_PATH_STYLE };
}

let cached: AppConfig | undefined;

/** The one place that reads process.env; exits with a list of problems when it is wrong. */
export function loadConfig(): AppConfig {
  if (cached) return cached;
  try {
    cached = parseConfig(process.env);
    return cached;
  } catch (error) {
    console.error((error as Error).message);
    process.exit(1);
  }
}
