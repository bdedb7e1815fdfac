import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ConfigError, validateEnvironment } from './environment.js';

/** Name of the file in the data folder that keeps the generated demo-mode JWT secret. */
export const DEMO_JWT_SECRET_FILE = 'jwt-secret';

/** The built web client, relative to this file (same depth in `src/config` and `dist/config`). */
const DEFAULT_WEB_DIST = fileURLToPath(new URL('../../../web/dist', import.meta.url));

/**
 * The resolved configuration of one server instance. Injected by class (`AppConfig`) wherever
 * a setting is needed; built once at boot by `loadConfig`.
 */
export class AppConfig {
  /** HTTP port. */
  readonly port: number;
  /** Absolute path of the data folder (created at boot). */
  readonly dataDir: string;
  /** Demo mode: demo accounts and data are seeded. */
  readonly demo: boolean;
  readonly jwtSecret: string;
  /** Real mail server; absent → the local mail catcher (demo and test mode) or no mail at all. */
  readonly smtpUrl?: string;
  /** Sender of every e-mail (MAIL_FROM). */
  readonly mailFrom: string;
  /**
   * Run the local mail catcher (a fake SMTP server whose messages the outbox shows): in demo
   * mode and in test runs (NODE_ENV=test) when no SMTP_URL is set.
   */
  readonly mailCatcher: boolean;
  /** PostgreSQL URL; absent → SQLite file in the data folder. */
  readonly databaseUrl?: string;
  readonly loginLimitPerMinute: number;
  /** Proxies in front of the server whose X-Forwarded-For is believed (Express `trust proxy`); 0: none. */
  readonly trustProxyHops: number;
  /** First admin, created outside demo mode when no admin exists. */
  readonly initialAdmin?: { email: string; password: string };
  /** Absolute path of the built web client (may not exist). */
  readonly webDist: string;
  /** Where people open Tacet (no trailing slash): the base of the links in e-mails (TACET_PUBLIC_URL). */
  readonly publicUrl: string;

  constructor(values: AppConfig) {
    Object.assign(this, values);
  }
}

/** Reads the demo secret from the data folder, creating it on first use. */
function demoJwtSecret(dataDir: string): string {
  const file = join(dataDir, DEMO_JWT_SECRET_FILE);
  if (!existsSync(file)) {
    try {
      writeFileSync(file, randomBytes(48).toString('base64url'), { mode: 0o600, flag: 'wx' });
    } catch (error) {
      // Another process created it between the check and the write: use theirs.
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
    }
  }
  const secret = readFileSync(file, 'utf8').trim();
  if (secret.length < 32) {
    throw new ConfigError([`${file} holds a JWT secret shorter than 32 characters; delete the file`]);
  }
  return secret;
}

/** The data folder resolved against `cwd`, created if missing. */
export function resolveDataDir(dataDirSetting: string | undefined, cwd = process.cwd()): string {
  const dataDir = resolve(cwd, dataDirSetting || './data');
  mkdirSync(dataDir, { recursive: true });
  return dataDir;
}

/**
 * Validates the environment and resolves every setting. Throws a ConfigError with a readable
 * list of problems; creates the data folder and, in demo mode without JWT_SECRET, a persisted
 * random secret so tokens survive restarts.
 */
export function loadConfig(rawEnv: Record<string, string | undefined>, cwd = process.cwd()): AppConfig {
  const env = validateEnvironment(rawEnv);
  const dataDir = resolveDataDir(env.TACET_DATA_DIR, cwd);
  const demo = env.TACET_DEMO;
  return new AppConfig({
    port: env.PORT,
    dataDir,
    demo,
    jwtSecret: env.JWT_SECRET ?? demoJwtSecret(dataDir),
    smtpUrl: env.SMTP_URL,
    mailFrom: env.MAIL_FROM,
    mailCatcher: !env.SMTP_URL && (demo || env.NODE_ENV === 'test'),
    databaseUrl: env.DATABASE_URL,
    loginLimitPerMinute: env.TACET_LOGIN_LIMIT_PER_MINUTE,
    trustProxyHops: env.TACET_TRUST_PROXY,
    initialAdmin:
      !demo && env.TACET_ADMIN_EMAIL && env.TACET_ADMIN_PASSWORD
        ? { email: env.TACET_ADMIN_EMAIL, password: env.TACET_ADMIN_PASSWORD }
        : undefined,
    webDist: env.TACET_WEB_DIST ? resolve(cwd, env.TACET_WEB_DIST) : DEFAULT_WEB_DIST,
    publicUrl: (env.TACET_PUBLIC_URL ?? `http://localhost:${env.PORT}`).replace(/\/+$/, ''),
  });
}
