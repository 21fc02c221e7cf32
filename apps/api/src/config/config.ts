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
}

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
  return {
    env: e.NODE_ENV,
    host: e.HOOPLINE_HOST,
    port: e.HOOPLINE_PORT,
    databaseUrl: e.DATABASE_URL,
    logLevel: e.HOOPLINE_LOG_LEVEL,
    webDist: e.HOOPLINE_WEB_DIST,
    publicUrl: e.HOOPLINE_PUBLIC_URL ?? `http://${e.HOOPLINE_HOST}:${e.HOOPLINE_PORT}`,
  };
}
