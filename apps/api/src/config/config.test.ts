import { describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from './config';

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
