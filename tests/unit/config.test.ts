import { afterEach, describe, expect, it, vi } from 'vitest';
import { checkConfig, ConfigError, config, EnvSchema } from '../../server/config.ts';

const saved = { ...process.env };
afterEach(() => {
  for (const key of Object.keys(process.env)) if (!(key in saved)) delete process.env[key];
  Object.assign(process.env, saved);
});

describe('the server configuration', () => {
  it('gives the documented defaults for an empty environment', () => {
    const env = checkConfig({});
    expect(env).toMatchObject({
      NODE_ENV: 'development',
      HOST: '127.0.0.1',
      PORT: 4780,
      STARPROOF_PGPORT: 54380,
      STARPROOF_STORAGE: 'local',
      STARPROOF_KIOSK_AUTH_CACHE_MS: 1000,
      STARPROOF_FEED_CHECK_MS: 1000,
      STARPROOF_PAIRING_LIMIT: 30,
      STARPROOF_PUBLIC_LIMIT: 300,
      STARPROOF_PUBLISHER_NAME: 'Starproof',
    });
    expect(env.DATABASE_URL).toBeUndefined();
    expect(env.STARPROOF_SIGNIN_LIMIT).toBeUndefined();
  });

  it('reads a setting again when its text changes, and checks an unchanged one only once', () => {
    const check = vi.spyOn(EnvSchema.shape.PASSWORD_HASH_MAX_WAIT_MS, 'safeParse');
    try {
      process.env.PASSWORD_HASH_MAX_WAIT_MS = '250';
      expect(config.passwordHashMaxWaitMs).toBe(250);
      const checks = check.mock.calls.length;
      expect(config.passwordHashMaxWaitMs).toBe(250);
      expect(check.mock.calls.length).toBe(checks);
      process.env.PASSWORD_HASH_MAX_WAIT_MS = '900';
      expect(config.passwordHashMaxWaitMs).toBe(900);
      process.env.PASSWORD_HASH_MAX_WAIT_MS = 'soon';
      expect(() => config.passwordHashMaxWaitMs).toThrow(ConfigError);
      delete process.env.PASSWORD_HASH_MAX_WAIT_MS;
      expect(config.passwordHashMaxWaitMs).toBe(5000);
    } finally {
      check.mockRestore();
    }
  });

  it('an empty variable counts as unset', () => {
    expect(checkConfig({ PORT: '', STARPROOF_STATEMENT_WORKERS: '' })).toMatchObject({ PORT: 4780 });
  });

  it('refuses bad values, naming every variable and what it must be', () => {
    let error: unknown;
    try {
      checkConfig({ PORT: 'eighty', STARPROOF_STORAGE: 'ftp', PUBLIC_URL: 'example.org', STARPROOF_UPLOAD_MAX_MB: '-5' });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(ConfigError);
    const message = (error as Error).message;
    expect(message).toMatch(/PORT must be a whole number from 0 to 65535, not "eighty"/);
    expect(message).toMatch(/STARPROOF_STORAGE must be "local" or "s3", not "ftp"/);
    expect(message).toMatch(/PUBLIC_URL must be a full URL/);
    expect(message).toMatch(/STARPROOF_UPLOAD_MAX_MB must be a positive number, not "-5"/);
  });

  it('reads a variable when asked, so a test may set it before first use', () => {
    process.env.STARPROOF_PUBLIC_LIMIT = '60';
    expect(config.limits.publicApi).toBe(60);
    process.env.STARPROOF_PUBLIC_LIMIT = '0';
    expect(() => config.limits.publicApi).toThrow(/STARPROOF_PUBLIC_LIMIT must be a whole number from 1/);
  });
});
