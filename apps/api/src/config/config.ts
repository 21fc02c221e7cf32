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
  HOOPLINE_LOG_LEVEL: z
    .enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'])
    .default('info'),
  /** Folder of the built web app to serve beside the API (production start). */
  HOOPLINE_WEB_DIST: z.string().min(1).optional(),
  /** Public base URL, used in links the API writes (mail, verify codes). */
  HOOPLINE_PUBLIC_URL: z.url().optional(),
  /** Signs access tokens (HS256). Required in production; development and test use DEV_JWT_SECRET. */
  HOOPLINE_JWT_SECRET: z.string().min(32, 'must be at least 32 characters').optional(),
  /** Access-token (JWT) lifetime, seconds. */
  HOOPLINE_ACCESS_TOKEN_TTL: z.coerce
    .number()
    .int()
    .min(1)
    .max(86_400)
    .default(15 * 60),
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
});

export type Environment = z.infer<typeof environmentSchema>;

export interface Config {
  readonly env: Environment['NODE_ENV'];
  readonly host: string;
  readonly port: number;
  readonly databaseUrl: string;
  readonly logLevel: Environment['HOOPLINE_LOG_LEVEL'];
  readonly webDist: string | undefined;
  readonly publicUrl: string;
  readonly auth: AuthConfig;
}

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
  const publicUrl = e.HOOPLINE_PUBLIC_URL ?? `http://${e.HOOPLINE_HOST}:${e.HOOPLINE_PORT}`;
  return {
    env: e.NODE_ENV,
    host: e.HOOPLINE_HOST,
    port: e.HOOPLINE_PORT,
    databaseUrl: e.DATABASE_URL,
    logLevel: e.HOOPLINE_LOG_LEVEL,
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
  };
}
