import path from 'node:path';
import { z } from 'zod';

/**
 * Every setting the API reads from the environment, checked once at start-up.
 * The typed result is passed to whatever needs it; nothing else reads
 * process.env.
 */
const environmentSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOOPLINE_HOST: z.string().min(1).default('127.0.0.1'),
  HOOPLINE_PORT: z.coerce.number().int().min(0).max(65535).default(8080),
  DATABASE_URL: z
    .string({ error: 'DATABASE_URL is required (scripts/pg.sh url prints the local one)' })
    .regex(/^postgres(ql)?:\/\//, 'must be a postgres:// URL'),
  /** API processes the start command runs (Node's cluster module); 1 runs no cluster. */
  HOOPLINE_WORKERS: z.coerce.number().int().min(1).max(64).default(1),
  /** Threads per API process that render PDF sheets, off the event loop. */
  HOOPLINE_SHEET_THREADS: z.coerce.number().int().min(1).max(16).default(1),
  /** Rendered sheets kept in PostgreSQL (table sheet_renders), megabytes; 0 keeps none. */
  HOOPLINE_SHEET_CACHE_MB: z.coerce.number().int().min(0).max(100_000).default(256),
  HOOPLINE_LOG_LEVEL: z
    .enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'])
    .default('info'),
  /** Folder of the built web app to serve beside the API (production start). */
  HOOPLINE_WEB_DIST: z.string().min(1).optional(),
  /** Public base URL, used in links the API writes (mail, verify codes). */
  HOOPLINE_PUBLIC_URL: z.url().optional(),
  /** Signs access tokens (HS256). Required in production; development and test use DEV_JWT_SECRET. */
  HOOPLINE_JWT_SECRET: z.string().min(32, 'must be at least 32 characters').optional(),
  /**
   * Access-token (JWT) lifetime, seconds. Short: the session check on every
   * request ends a signed-out session at once, and this bounds what a copied
   * token is worth while its session lives.
   */
  HOOPLINE_ACCESS_TOKEN_TTL: z.coerce
    .number()
    .int()
    .min(1)
    .max(86_400)
    .default(5 * 60),
  /** Refresh-token lifetime, seconds. */
  HOOPLINE_REFRESH_TOKEN_TTL: z.coerce
    .number()
    .int()
    .min(60)
    .max(365 * 86_400)
    .default(30 * 86_400),
  /** Invitation and password-reset token lifetimes, seconds. */
  HOOPLINE_INVITATION_TTL: z.coerce
    .number()
    .int()
    .min(60)
    .max(90 * 86_400)
    .default(7 * 86_400),
  HOOPLINE_PASSWORD_RESET_TTL: z.coerce
    .number()
    .int()
    .min(60)
    .max(7 * 86_400)
    .default(3600),
  /** Failed sign-ins allowed per account and per client address in one window. */
  HOOPLINE_SIGN_IN_LIMIT_PER_ACCOUNT: z.coerce.number().int().min(1).default(10),
  HOOPLINE_SIGN_IN_LIMIT_PER_ADDRESS: z.coerce.number().int().min(1).default(100),
  HOOPLINE_SIGN_IN_WINDOW: z.coerce
    .number()
    .int()
    .min(1)
    .default(15 * 60),
  /** Secure flag on cookies; defaults to whether the public URL is https. */
  HOOPLINE_COOKIE_SECURE: z.enum(['true', 'false']).optional(),

  /** Mail: the SMTP server the outbox worker sends through. Without a host, mail waits in the outbox. */
  HOOPLINE_SMTP_HOST: z.string().min(1).optional(),
  HOOPLINE_SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(587),
  HOOPLINE_SMTP_SECURE: z.enum(['true', 'false']).default('false'),
  HOOPLINE_SMTP_USER: z.string().min(1).optional(),
  HOOPLINE_SMTP_PASSWORD: z.string().min(1).optional(),
  HOOPLINE_MAIL_FROM: z.string().min(3).default('Hoopline <hoopline@localhost>'),
  /** How often the worker looks for due mail, milliseconds. */
  HOOPLINE_MAIL_POLL_MS: z.coerce.number().int().min(50).max(600_000).default(2000),
  /** First retry delay after a failed send, milliseconds; it doubles per attempt up to 15 minutes. */
  HOOPLINE_MAIL_RETRY_BASE_MS: z.coerce.number().int().min(10).max(3_600_000).default(5000),

  /** Uploads: 'local' (a folder) or 's3' (an S3-compatible bucket). */
  HOOPLINE_STORAGE: z.enum(['local', 's3']).default('local'),
  HOOPLINE_UPLOAD_DIR: z.string().min(1).optional(),
  HOOPLINE_UPLOAD_MAX_BYTES: z.coerce
    .number()
    .int()
    .min(1024)
    .max(1024 * 1024 * 1024)
    .default(20 * 1024 * 1024),
  /** How often the upload sweep removes leftovers of interrupted uploads, seconds (it also runs at start-up). */
  HOOPLINE_UPLOAD_SWEEP_INTERVAL: z.coerce
    .number()
    .int()
    .min(1)
    .max(7 * 86_400)
    .default(3600),
  /** A half-written file or unreferenced blob younger than this many seconds is left alone. */
  HOOPLINE_UPLOAD_SWEEP_GRACE: z.coerce
    .number()
    .int()
    .min(0)
    .max(30 * 86_400)
    .default(3600),
  HOOPLINE_S3_ENDPOINT: z.url().optional(),
  HOOPLINE_S3_REGION: z.string().min(1).default('us-east-1'),
  HOOPLINE_S3_BUCKET: z.string().min(3).optional(),
  HOOPLINE_S3_PREFIX: z.string().default(''),
  HOOPLINE_S3_ACCESS_KEY_ID: z.string().min(1).optional(),
  HOOPLINE_S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
});

export type Environment = z.infer<typeof environmentSchema>;

export interface Config {
  readonly env: Environment['NODE_ENV'];
  readonly host: string;
  readonly port: number;
  readonly databaseUrl: string;
  readonly logLevel: Environment['HOOPLINE_LOG_LEVEL'];
  /** API processes (cluster workers) to run. */
  readonly workers: number;
  readonly sheets: SheetsConfig;
  readonly webDist: string | undefined;
  readonly publicUrl: string;
  readonly auth: AuthConfig;
  readonly mail: MailConfig;
  readonly storage: StorageConfig;
}

export interface SheetsConfig {
  /** Worker threads per process that render sheets. */
  readonly renderThreads: number;
  /** Upper bound of the rendered-sheet cache, bytes (0: no cache). */
  readonly cacheBytes: number;
}

export interface MailConfig {
  /** null: no SMTP server configured; mail waits in the outbox and tokens are shown to the admin. */
  readonly smtp: {
    readonly host: string;
    readonly port: number;
    readonly secure: boolean;
    readonly auth: { readonly user: string; readonly pass: string } | null;
  } | null;
  readonly from: string;
  readonly pollIntervalMs: number;
  readonly retryBaseMs: number;
}

export type StorageConfig = {
  readonly maxUploadBytes: number;
  /** The upload sweep (storage/upload-sweeper.ts), milliseconds. */
  readonly sweepIntervalMs: number;
  readonly sweepGraceMs: number;
} & (
  | { readonly driver: 'local'; readonly folder: string }
  | {
      readonly driver: 's3';
      readonly endpoint: string | undefined;
      readonly region: string;
      readonly bucket: string;
      readonly prefix: string;
      readonly accessKeyId: string;
      readonly secretAccessKey: string;
    }
);

/** Uploads land here unless HOOPLINE_UPLOAD_DIR says otherwise: the repository's git-ignored .data/. */
const DEFAULT_UPLOAD_DIR = path.resolve(import.meta.dirname, '../../../../.data/uploads');

export interface AuthConfig {
  readonly jwtSecret: string;
  /** True when jwtSecret is the fixed development secret (never in production). */
  readonly usingDevSecret: boolean;
  /** Seconds. */
  readonly accessTokenTtl: number;
  readonly refreshTokenTtl: number;
  readonly invitationTtl: number;
  readonly passwordResetTtl: number;
  /**
   * A rotated refresh token presented again within this many seconds is
   * refused without revoking its family (two tabs refreshing at once);
   * later it counts as reuse and revokes the family.
   */
  readonly refreshReuseGrace: number;
  readonly signInLimitPerAccount: number;
  readonly signInLimitPerAddress: number;
  /** Seconds. */
  readonly signInWindow: number;
  readonly cookieSecure: boolean;
  /** argon2id cost; OWASP's minimum (19 MiB, t = 2) normally, cheap under NODE_ENV=test. */
  readonly argon2: {
    readonly memoryCost: number;
    readonly timeCost: number;
    readonly parallelism: number;
  };
}

/**
 * Signs tokens in development and test when HOOPLINE_JWT_SECRET is unset. It
 * is in the source, so it protects nothing: production refuses to start
 * without a secret of its own.
 */
export const DEV_JWT_SECRET = 'hoopline-development-secret-not-for-production-use';

export class ConfigError extends Error {
  override readonly name = 'ConfigError';
}

/** Parses the environment into a Config or throws a ConfigError naming each bad variable. */
export function loadConfig(environment: NodeJS.ProcessEnv = process.env): Config {
  const parsed = environmentSchema.safeParse(environment);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => {
      const name = issue.path.join('.') || '(environment)';
      return `  ${name}: ${issue.message}`;
    });
    throw new ConfigError(`invalid configuration:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  if (e.NODE_ENV === 'production' && !e.HOOPLINE_JWT_SECRET) {
    throw new ConfigError(
      'invalid configuration:\n  HOOPLINE_JWT_SECRET: is required in production (at least 32 characters)',
    );
  }
  if (e.HOOPLINE_STORAGE === 's3') {
    const missing = (
      ['HOOPLINE_S3_BUCKET', 'HOOPLINE_S3_ACCESS_KEY_ID', 'HOOPLINE_S3_SECRET_ACCESS_KEY'] as const
    ).filter((name) => !e[name]);
    if (missing.length > 0) {
      throw new ConfigError(
        `invalid configuration:\n${missing.map((m) => `  ${m}: is required when HOOPLINE_STORAGE=s3`).join('\n')}`,
      );
    }
  }
  if (Boolean(e.HOOPLINE_SMTP_USER) !== Boolean(e.HOOPLINE_SMTP_PASSWORD)) {
    throw new ConfigError(
      'invalid configuration:\n  HOOPLINE_SMTP_PASSWORD: give both HOOPLINE_SMTP_USER and HOOPLINE_SMTP_PASSWORD, or neither',
    );
  }
  const publicUrl = e.HOOPLINE_PUBLIC_URL ?? `http://${e.HOOPLINE_HOST}:${e.HOOPLINE_PORT}`;
  return {
    env: e.NODE_ENV,
    host: e.HOOPLINE_HOST,
    port: e.HOOPLINE_PORT,
    databaseUrl: e.DATABASE_URL,
    logLevel: e.HOOPLINE_LOG_LEVEL,
    workers: e.HOOPLINE_WORKERS,
    sheets: {
      renderThreads: e.HOOPLINE_SHEET_THREADS,
      cacheBytes: e.HOOPLINE_SHEET_CACHE_MB * 1024 * 1024,
    },
    webDist: e.HOOPLINE_WEB_DIST,
    publicUrl,
    auth: {
      jwtSecret: e.HOOPLINE_JWT_SECRET ?? DEV_JWT_SECRET,
      usingDevSecret: !e.HOOPLINE_JWT_SECRET,
      accessTokenTtl: e.HOOPLINE_ACCESS_TOKEN_TTL,
      refreshTokenTtl: e.HOOPLINE_REFRESH_TOKEN_TTL,
      invitationTtl: e.HOOPLINE_INVITATION_TTL,
      passwordResetTtl: e.HOOPLINE_PASSWORD_RESET_TTL,
      refreshReuseGrace: 10,
      signInLimitPerAccount: e.HOOPLINE_SIGN_IN_LIMIT_PER_ACCOUNT,
      signInLimitPerAddress: e.HOOPLINE_SIGN_IN_LIMIT_PER_ADDRESS,
      signInWindow: e.HOOPLINE_SIGN_IN_WINDOW,
      cookieSecure: e.HOOPLINE_COOKIE_SECURE
        ? e.HOOPLINE_COOKIE_SECURE === 'true'
        : publicUrl.startsWith('https:'),
      // Test runs hash hundreds of passwords: the cheapest argon2id the library
      // accepts keeps the suite fast. Never used outside NODE_ENV=test.
      argon2:
        e.NODE_ENV === 'test'
          ? { memoryCost: 1024, timeCost: 1, parallelism: 1 }
          : { memoryCost: 19_456, timeCost: 2, parallelism: 1 },
    },
    mail: {
      smtp: e.HOOPLINE_SMTP_HOST
        ? {
            host: e.HOOPLINE_SMTP_HOST,
            port: e.HOOPLINE_SMTP_PORT,
            secure: e.HOOPLINE_SMTP_SECURE === 'true',
            auth:
              e.HOOPLINE_SMTP_USER && e.HOOPLINE_SMTP_PASSWORD
                ? { user: e.HOOPLINE_SMTP_USER, pass: e.HOOPLINE_SMTP_PASSWORD }
                : null,
          }
        : null,
      from: e.HOOPLINE_MAIL_FROM,
      pollIntervalMs: e.HOOPLINE_MAIL_POLL_MS,
      retryBaseMs: e.HOOPLINE_MAIL_RETRY_BASE_MS,
    },
    storage:
      e.HOOPLINE_STORAGE === 's3'
        ? {
            driver: 's3',
            maxUploadBytes: e.HOOPLINE_UPLOAD_MAX_BYTES,
            sweepIntervalMs: e.HOOPLINE_UPLOAD_SWEEP_INTERVAL * 1000,
            sweepGraceMs: e.HOOPLINE_UPLOAD_SWEEP_GRACE * 1000,
            endpoint: e.HOOPLINE_S3_ENDPOINT,
            region: e.HOOPLINE_S3_REGION,
            bucket: e.HOOPLINE_S3_BUCKET!,
            prefix: e.HOOPLINE_S3_PREFIX,
            accessKeyId: e.HOOPLINE_S3_ACCESS_KEY_ID!,
            secretAccessKey: e.HOOPLINE_S3_SECRET_ACCESS_KEY!,
          }
        : {
            driver: 'local',
            maxUploadBytes: e.HOOPLINE_UPLOAD_MAX_BYTES,
            sweepIntervalMs: e.HOOPLINE_UPLOAD_SWEEP_INTERVAL * 1000,
            sweepGraceMs: e.HOOPLINE_UPLOAD_SWEEP_GRACE * 1000,
            folder: path.resolve(e.HOOPLINE_UPLOAD_DIR ?? DEFAULT_UPLOAD_DIR),
          },
  };
}
