import { describe, expect, it } from 'vitest';
import { ConfigError, validateConfig } from './config.schema.js';

describe('validateConfig', () => {
  it('fills the defaults', () => {
    const c = validateConfig({});
    expect(c.PORT).toBe(3000);
    expect(c.NODE_ENV).toBe('development');
    expect(c.databasePath).toMatch(/data\/jarday\.sqlite$/);
    expect(c.storageDir).toBe(`${c.dataDir}/uploads`);
    expect(c.DEMO_MODE).toBe(false);
  });

  it.each([
    [{ PORT: 'abc' }, 'PORT'],
    [{ PORT: '70000' }, 'PORT'],
    [{ DEMO_MODE: 'maybe' }, 'DEMO_MODE'],
    [{ JWT_SECRET: 'short' }, 'JWT_SECRET'],
    [{ NODE_ENV: 'production' }, 'JWT_SECRET'],
    [{ SMTP_URL: 'not a url' }, 'SMTP_URL'],
    [{ SMTP_URL: 'http://mail.example.test' }, 'SMTP_URL'],
    [{ SMTP_URL: 'smtp://127.0.0.1:2525', MAIL_CATCHER: 'true' }, 'MAIL_CATCHER'],
    [{ MAIL_CATCHER_PORT: '70000' }, 'MAIL_CATCHER_PORT'],
    [{ REMINDER_CHECK_SECONDS: '0' }, 'REMINDER_CHECK_SECONDS'],
    [{ NODE_ENV: 'staging' }, 'NODE_ENV'],
  ])('refuses %o, naming %s', (env, setting) => {
    expect(() => validateConfig(env)).toThrow(ConfigError);
    expect(() => validateConfig(env)).toThrow(new RegExp(`^  ${setting}:`, 'm'));
  });

  it('accepts a production setup with a secret', () => {
    const c = validateConfig({ NODE_ENV: 'production', JWT_SECRET: 'x'.repeat(40), PORT: '8080', DEMO_MODE: 'true' });
    expect(c.PORT).toBe(8080);
    expect(c.DEMO_MODE).toBe(true);
  });

  it('runs the loopback mail catcher in development and demo mode, not in tests unless asked, never beside SMTP_URL', () => {
    expect(validateConfig({}).mailCatcher).toBe(true);
    expect(validateConfig({ NODE_ENV: 'test' }).mailCatcher).toBe(false);
    expect(validateConfig({ NODE_ENV: 'test', DEMO_MODE: 'true' }).mailCatcher).toBe(false);
    expect(validateConfig({ NODE_ENV: 'test', MAIL_CATCHER: 'true' }).mailCatcher).toBe(true);
    expect(validateConfig({ MAIL_CATCHER: 'false' }).mailCatcher).toBe(false);
    expect(validateConfig({ SMTP_URL: 'smtps://mail.example.test:465' }).mailCatcher).toBe(false);
    const prod = { NODE_ENV: 'production', JWT_SECRET: 'x'.repeat(40) };
    expect(validateConfig({ ...prod, DEMO_MODE: 'true' }).mailCatcher).toBe(true);
    expect(validateConfig(prod).mailCatcher).toBe(false);
  });
});
