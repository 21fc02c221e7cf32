import { describe, expect, it } from 'vitest';
import { ConfigError, DEV_JWT_SECRET, loadConfig } from './config';

describe('loadConfig', () => {
  it('accepts a minimal environment and fills defaults', () => {
    const config = loadConfig({ DATABASE_URL: 'postgres://u:p@127.0.0.1:5432/db' });
    expect(config.host).toBe('127.0.0.1');
    expect(config.port).toBe(8080);
    expect(config.publicUrl).toBe('http://127.0.0.1:8080');
  });

  it('names each bad variable and the reason', () => {
    expect(() => loadConfig({ HOOPLINE_PORT: 'eighty' })).toThrow(ConfigError);
    try {
      loadConfig({ HOOPLINE_PORT: '70000', DATABASE_URL: 'mysql://x' });
    } catch (error) {
      expect((error as Error).message).toMatch(/HOOPLINE_PORT/);
      expect((error as Error).message).toMatch(/DATABASE_URL: must be a postgres:\/\/ URL/);
      return;
    }
    throw new Error('expected a ConfigError');
  });

  it('says DATABASE_URL is required when it is missing', () => {
    expect(() => loadConfig({})).toThrow(/DATABASE_URL is required/);
  });
});

describe('loadConfig: auth settings', () => {
  const url = 'postgres://u:p@127.0.0.1:5432/db';

  it('refuses to start in production without a JWT secret', () => {
    expect(() => loadConfig({ DATABASE_URL: url, NODE_ENV: 'production' })).toThrow(
      /HOOPLINE_JWT_SECRET: is required in production/,
    );
  });

  it('refuses a JWT secret shorter than 32 characters', () => {
    expect(() => loadConfig({ DATABASE_URL: url, HOOPLINE_JWT_SECRET: 'short' })).toThrow(
      /HOOPLINE_JWT_SECRET: must be at least 32 characters/,
    );
  });

  it('uses the fixed development secret outside production and says so', () => {
    const config = loadConfig({ DATABASE_URL: url, NODE_ENV: 'development' });
    expect(config.auth.jwtSecret).toBe(DEV_JWT_SECRET);
    expect(config.auth.usingDevSecret).toBe(true);
    const production = loadConfig({
      DATABASE_URL: url,
      NODE_ENV: 'production',
      HOOPLINE_JWT_SECRET: 'x'.repeat(40),
    });
    expect(production.auth.usingDevSecret).toBe(false);
    expect(production.auth.argon2.memoryCost).toBe(19_456);
  });

  it('reads token lifetimes and sets Secure cookies for an https public URL', () => {
    const config = loadConfig({
      DATABASE_URL: url,
      HOOPLINE_ACCESS_TOKEN_TTL: '60',
      HOOPLINE_PUBLIC_URL: 'https://hoopline.example',
    });
    expect(config.auth.accessTokenTtl).toBe(60);
    expect(config.auth.refreshTokenTtl).toBe(30 * 86_400);
    expect(config.auth.cookieSecure).toBe(true);
  });
});
