import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from '../../server/config';
import fs from 'node:fs';
import os from 'node:os';

const root = fs.mkdtempSync(path.join(os.tmpdir(), 'tessera-cfg-'));

describe('configuration', () => {
  it('when nothing is set, then the documented defaults apply and a JWT secret is made once and kept beside the database', () => {
    const c = loadConfig({}, root);
    expect(c.port).toBe(8080);
    expect(c.host).toBe('127.0.0.1');
    expect(c.databasePath).toBe(path.join(root, 'data/tessera.sqlite'));
    expect(c.webDir).toBe(path.join(root, 'dist/web'));
    expect(c.smtp).toBeNull();
    expect(c.appOrigins).toContain('http://127.0.0.1:8080');
    expect(c.jwtSecret.length).toBeGreaterThanOrEqual(32);
    expect(loadConfig({}, root).jwtSecret).toBe(c.jwtSecret);
    expect(fs.statSync(`${c.databasePath}.jwt-secret`).mode & 0o777).toBe(0o600);
  });

  it.each([
    [{ PORT: 'eighty' }, 'PORT: must be a whole number (got "eighty")'],
    [{ PORT: '70000' }, 'PORT: must be between 0 and 65535 (got "70000")'],
    [{ JWT_SECRET: 'short' }, 'JWT_SECRET: must be at least 32 characters (got "short")'],
    [{ SMTP_PORT: '25' }, 'SMTP_HOST: must be set when other SMTP_* settings are given'],
    [{ SMTP_HOST: 'mail.test', SMTP_USER: 'u' }, 'SMTP_PASS: must be set when SMTP_USER is given'],
    [{ SMTP_HOST: 'mail.test', SMTP_SECURE: 'maybe' }, 'SMTP_SECURE: must be true or false (got "maybe")'],
    [{ APP_ORIGIN: 'not a url' }, 'APP_ORIGIN: "not a url" is not an origin such as http://127.0.0.1:8080'],
    [{ LOG_LEVEL: 'loud' }, /^LOG_LEVEL: /],
  ])('when %o is set, then start-up is refused with a message naming the variable', (env, message) => {
    expect(() => loadConfig(env as Record<string, string>, root)).toThrow(ConfigError);
    expect(() => loadConfig(env as Record<string, string>, root)).toThrow(message);
  });

  it('when SMTP_HOST is given, then real SMTP is configured (587 unless told)', () => {
    const c = loadConfig({ SMTP_HOST: 'mail.test', SMTP_USER: 'u', SMTP_PASS: 'p', JWT_SECRET: 'x'.repeat(32) }, root);
    expect(c.smtp).toEqual({ host: 'mail.test', port: 587, secure: false, user: 'u', pass: 'p', allowSelfSigned: false });
  });
});
