// Configuration from the environment (server/src/config.ts): defaults, validation messages, the kept JWT secret.
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { ConfigError, loadConfig, persistentSecret } from '../../server/src/config';

const dir = mkdtempSync(join(tmpdir(), 'loftline-config-test-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const fixedSecret = () => 's'.repeat(40);

describe('loadConfig', () => {
  it('defaults: 127.0.0.1:8080, fake mail, APP_URL from host and port, 15-minute access tokens', () => {
    const c = loadConfig({}, fixedSecret);
    expect(c).toMatchObject({ port: 8080, host: '127.0.0.1', appUrl: 'http://127.0.0.1:8080', logLevel: 'info', accessTokenTtlS: 900, passwordResetTtlS: 3600 });
    expect(c.mail.transport).toBe('fake');
    expect(c.dataDir.endsWith('.loftline')).toBe(true);
  });

  it('PORT, HOST, APP_URL and DATA_DIR change it', () => {
    const c = loadConfig({ PORT: '9001', HOST: '0.0.0.0', APP_URL: 'https://field.example.test/', DATA_DIR: dir }, fixedSecret);
    expect(c).toMatchObject({ port: 9001, host: '0.0.0.0', appUrl: 'https://field.example.test', dataDir: dir });
  });

  it.each([
    [{ PORT: 'eighty' }, 'PORT'],
    [{ PORT: '70000' }, 'PORT'],
    [{ MAIL_TRANSPORT: 'pigeon' }, 'MAIL_TRANSPORT'],
    [{ MAIL_TRANSPORT: 'smtp' }, 'SMTP_HOST'],
    [{ JWT_SECRET: 'short' }, 'JWT_SECRET'],
    [{ LOG_LEVEL: 'loud' }, 'LOG_LEVEL'],
    [{ DATABASE_URL: 'not a url' }, 'DATABASE_URL'],
  ])('%o is refused with a message naming %s', (env, name) => {
    expect(() => loadConfig(env, fixedSecret)).toThrow(ConfigError);
    expect(() => loadConfig(env, fixedSecret)).toThrow(new RegExp(name));
  });

  it('SMTP settings switch mail to the named server', () => {
    const c = loadConfig({ MAIL_TRANSPORT: 'smtp', SMTP_HOST: 'mail.example.test', SMTP_PORT: '465', SMTP_USER: 'u', SMTP_PASS: 'p' }, fixedSecret);
    expect(c.mail).toMatchObject({ transport: 'smtp', smtp: { host: 'mail.example.test', port: 465, user: 'u', pass: 'p' } });
  });

  it('without JWT_SECRET a random secret is made once, kept (mode 0600) and reused', () => {
    const a = persistentSecret(dir);
    const b = loadConfig({ DATA_DIR: dir }).jwtSecret;
    expect(a.length).toBeGreaterThanOrEqual(32);
    expect(b).toBe(a);
    expect(readFileSync(join(dir, 'jwt-secret'), 'utf8').trim()).toBe(a);
    expect(statSync(join(dir, 'jwt-secret')).mode & 0o777).toBe(0o600);
  });

  it('JWT_SECRET given wins over the kept one', () => {
    expect(loadConfig({ DATA_DIR: dir, JWT_SECRET: 'k'.repeat(32) }).jwtSecret).toBe('k'.repeat(32));
  });
});
