import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DEMO_JWT_SECRET_FILE, loadConfig } from './app-config.js';
import { ConfigError } from './environment.js';

const SECRET = 'x'.repeat(32);

describe('loadConfig', () => {
  let cwd: string;
  beforeEach(() => {
    cwd = mkdtempSync(join(tmpdir(), 'tacet-config-'));
  });
  afterEach(() => rmSync(cwd, { recursive: true, force: true }));

  const problemsOf = (env: Record<string, string>): string[] => {
    try {
      loadConfig(env, cwd);
    } catch (error) {
      if (error instanceof ConfigError) return error.problems;
      throw error;
    }
    return [];
  };

  it('applies the defaults and creates ./data under the working folder', () => {
    const config = loadConfig({ JWT_SECRET: SECRET, TACET_ADMIN_EMAIL: 'a@b.test', TACET_ADMIN_PASSWORD: 'long enough!' }, cwd);
    expect(config).toMatchObject({
      port: 3000,
      dataDir: join(cwd, 'data'),
      demo: false,
      jwtSecret: SECRET,
      loginLimitPerMinute: 20,
      trustProxyHops: 0,
      initialAdmin: { email: 'a@b.test', password: 'long enough!' },
    });
    expect(config.webDist).toMatch(/packages[/\\]web[/\\]dist$/);
    expect(existsSync(join(cwd, 'data'))).toBe(true);
  });

  it('reads every setting (empty strings count as unset)', () => {
    const config = loadConfig(
      {
        PORT: '8080',
        TACET_DATA_DIR: 'var/tacet',
        TACET_DEMO: 'false',
        JWT_SECRET: SECRET,
        SMTP_URL: 'smtp://mail.example.test:2525',
        DATABASE_URL: 'postgresql://tacet@db.example.test/tacet',
        TACET_LOGIN_LIMIT_PER_MINUTE: '5',
        TACET_TRUST_PROXY: '2',
        TACET_WEB_DIST: 'web',
        TACET_ADMIN_EMAIL: '',
      },
      cwd,
    );
    expect(config).toMatchObject({
      port: 8080,
      dataDir: join(cwd, 'var/tacet'),
      smtpUrl: 'smtp://mail.example.test:2525',
      databaseUrl: 'postgresql://tacet@db.example.test/tacet',
      loginLimitPerMinute: 5,
      trustProxyHops: 2,
      webDist: join(cwd, 'web'),
      initialAdmin: undefined,
    });
  });

  it('requires JWT_SECRET of at least 32 characters outside demo mode', () => {
    expect(problemsOf({})).toEqual([expect.stringContaining('JWT_SECRET is required outside demo mode')]);
    expect(problemsOf({ JWT_SECRET: 'short' })).toEqual(['JWT_SECRET must be at least 32 characters long']);
    expect(problemsOf({ TACET_DEMO: 'true', JWT_SECRET: 'short' })).toEqual(['JWT_SECRET must be at least 32 characters long']);
  });

  it('refuses the demo password and short passwords for the first admin outside demo mode', () => {
    const env = { JWT_SECRET: SECRET, TACET_ADMIN_EMAIL: 'admin@example.test' };
    expect(problemsOf({ ...env, TACET_ADMIN_PASSWORD: 'tacet-demo' })).toEqual(['TACET_ADMIN_PASSWORD must not be the demo password']);
    expect(problemsOf({ ...env, TACET_ADMIN_PASSWORD: 'short' })).toEqual(['TACET_ADMIN_PASSWORD must be at least 10 characters long']);
    expect(problemsOf({ JWT_SECRET: SECRET, TACET_ADMIN_PASSWORD: 'long enough!' })).toEqual([
      'TACET_ADMIN_EMAIL is required when TACET_ADMIN_PASSWORD is set',
    ]);
    expect(problemsOf({ ...env, TACET_ADMIN_EMAIL: 'not-an-email', TACET_ADMIN_PASSWORD: 'long enough!' })).toEqual([
      'TACET_ADMIN_EMAIL must be an email address',
    ]);
  });

  it('lists every problem at once, naming the variable', () => {
    const problems = problemsOf({
      PORT: 'eighty',
      TACET_DEMO: 'yes',
      DATABASE_URL: 'mysql://db/tacet',
      SMTP_URL: 'mail.example.test',
      TACET_LOGIN_LIMIT_PER_MINUTE: '0',
      TACET_TRUST_PROXY: 'yes',
    });
    expect(problems).toEqual(
      expect.arrayContaining([
        'PORT must be an integer',
        'TACET_DEMO must be true or false',
        'DATABASE_URL must be a postgres:// URL',
        'SMTP_URL must be an smtp:// or smtps:// URL',
        'TACET_LOGIN_LIMIT_PER_MINUTE must not be less than 1',
        'TACET_TRUST_PROXY must be an integer (the number of proxies in front of the server)',
      ]),
    );
    expect(new ConfigError(problems).message).toMatch(/^Invalid configuration:\n {2}- /);
  });

  it('in demo mode without JWT_SECRET, generates a secret once and keeps it in the data folder', () => {
    const env = { TACET_DEMO: 'true', TACET_DATA_DIR: 'demo-data' };
    const first = loadConfig(env, cwd);
    const file = join(cwd, 'demo-data', DEMO_JWT_SECRET_FILE);
    expect(first.jwtSecret.length).toBeGreaterThanOrEqual(32);
    expect(readFileSync(file, 'utf8')).toBe(first.jwtSecret);
    expect(loadConfig(env, cwd).jwtSecret).toBe(first.jwtSecret);
    // An explicit secret wins and the demo accounts need no admin settings.
    expect(loadConfig({ ...env, JWT_SECRET: SECRET }, cwd)).toMatchObject({ jwtSecret: SECRET, initialAdmin: undefined });
  });

  it('sends mail from MAIL_FROM (default "Tacet <no-reply@tacet.test>") and refuses a malformed sender', () => {
    const env = { JWT_SECRET: SECRET };
    expect(loadConfig(env, cwd).mailFrom).toBe('Tacet <no-reply@tacet.test>');
    expect(loadConfig({ ...env, MAIL_FROM: 'Mounts desk <desk@example.test>' }, cwd).mailFrom).toBe('Mounts desk <desk@example.test>');
    expect(loadConfig({ ...env, MAIL_FROM: 'desk@example.test' }, cwd).mailFrom).toBe('desk@example.test');
    for (const bad of ['Tacet', 'Tacet <desk>', 'a@b.test\r\nBcc: c@d.test']) {
      expect(problemsOf({ ...env, MAIL_FROM: bad })).toEqual(['MAIL_FROM must be an address such as "Tacet <no-reply@example.com>"']);
    }
  });

  it('runs the local mail catcher in demo mode and in test runs, never when SMTP_URL is set', () => {
    const base = { JWT_SECRET: SECRET };
    const smtp = { SMTP_URL: 'smtp://mail.example.test:2525' };
    expect(loadConfig(base, cwd).mailCatcher).toBe(false);
    expect(loadConfig({ ...base, NODE_ENV: 'production' }, cwd).mailCatcher).toBe(false);
    expect(loadConfig({ ...base, TACET_DEMO: 'true' }, cwd).mailCatcher).toBe(true);
    expect(loadConfig({ ...base, NODE_ENV: 'test' }, cwd).mailCatcher).toBe(true);
    expect(loadConfig({ ...base, TACET_DEMO: 'true', ...smtp }, cwd).mailCatcher).toBe(false);
    expect(loadConfig({ ...base, NODE_ENV: 'test', ...smtp }, cwd).mailCatcher).toBe(false);
  });

  it('puts TACET_PUBLIC_URL (default http://localhost:<PORT>) in links, without a trailing slash, and refuses a malformed one', () => {
    const env = { JWT_SECRET: SECRET };
    expect(loadConfig(env, cwd).publicUrl).toBe('http://localhost:3000');
    expect(loadConfig({ ...env, PORT: '8080' }, cwd).publicUrl).toBe('http://localhost:8080');
    expect(loadConfig({ ...env, TACET_PUBLIC_URL: 'https://tacet.example.com/' }, cwd).publicUrl).toBe('https://tacet.example.com');
    expect(loadConfig({ ...env, TACET_PUBLIC_URL: 'https://example.com/tools/tacet' }, cwd).publicUrl).toBe(
      'https://example.com/tools/tacet',
    );
    for (const bad of ['tacet.example.com', 'ftp://tacet.example.com', 'https://tacet.example.com/?x=1', 'https://a b.test']) {
      expect(problemsOf({ ...env, TACET_PUBLIC_URL: bad })).toEqual([
        expect.stringContaining('TACET_PUBLIC_URL must be the http:// or https://'),
      ]);
    }
  });
});
