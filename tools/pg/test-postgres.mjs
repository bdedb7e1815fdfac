// A throwaway PostgreSQL cluster for tests: initdb into a temp folder, trust authentication on
// the loopback address only, a free port, the socket inside the folder, no fsync. Used by
// tools/run-tests.mjs (suite server-pg) and by start-test-postgres.mjs / stop-test-postgres.mjs.
//
// PostgreSQL refuses to run as root: when we are root the cluster belongs to the `postgres`
// system user (created by Debian's postgresql package) and every server command runs through
// `runuser -u postgres --`.
import { spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { freePort } from '../harness/server.mjs';

/** Thrown when no PostgreSQL server binaries are installed. */
export class PostgresNotInstalledError extends Error {
  constructor() {
    super('PostgreSQL is not installed (no initdb under /usr/lib/postgresql/*/bin, in PG_BIN or on PATH)');
    this.name = 'PostgresNotInstalledError';
  }
}

const STATE_FILE = 'state.json';

/** Folder of initdb / pg_ctl: $PG_BIN, the newest /usr/lib/postgresql/<v>/bin, or PATH. */
export function findPostgresBin() {
  const candidates = [];
  if (process.env.PG_BIN) candidates.push(process.env.PG_BIN);
  const debian = '/usr/lib/postgresql';
  if (existsSync(debian)) {
    const versions = readdirSync(debian)
      .filter((v) => /^\d+(\.\d+)?$/.test(v))
      .sort((a, b) => Number(b) - Number(a));
    candidates.push(...versions.map((v) => join(debian, v, 'bin')));
  }
  for (const dir of candidates) if (existsSync(join(dir, 'initdb')) && existsSync(join(dir, 'pg_ctl'))) return dir;
  const which = spawnSync('sh', ['-c', 'command -v initdb'], { encoding: 'utf8' });
  const onPath = which.status === 0 ? which.stdout.trim() : '';
  return onPath ? join(onPath, '..') : null;
}

const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;

function postgresUser() {
  const id = (flag) => spawnSync('id', [flag, 'postgres'], { encoding: 'utf8' });
  const uid = id('-u');
  const gid = id('-g');
  if (uid.status !== 0 || gid.status !== 0) {
    throw new Error('running as root needs the "postgres" system user (Debian\'s postgresql package creates it)');
  }
  return { uid: Number(uid.stdout), gid: Number(gid.stdout) };
}

/** Runs a PostgreSQL program (as the postgres user when we are root); throws with its output on failure. */
function pgRun(bin, program, args, cwd) {
  const command = join(bin, program);
  const [cmd, argv] = isRoot() ? ['runuser', ['-u', 'postgres', '--', command, ...args]] : [command, args];
  const r = spawnSync(cmd, argv, { cwd, encoding: 'utf8', env: { ...process.env, LC_ALL: 'C.UTF-8' } });
  if (r.status !== 0) {
    throw new Error(`${program} ${args.join(' ')} failed (exit ${r.status}):\n${r.stdout ?? ''}${r.stderr ?? ''}`);
  }
  return r.stdout;
}

/** The admin URL of the cluster (superuser `postgres`, database `postgres`, no password). */
export const adminUrl = (port) => `postgres://postgres@127.0.0.1:${port}/postgres`;

function readState(dir) {
  try {
    return JSON.parse(readFileSync(join(dir, STATE_FILE), 'utf8'));
  } catch {
    return null;
  }
}

function isRunning(bin, dir) {
  const data = join(dir, 'data');
  if (!existsSync(join(data, 'PG_VERSION'))) return false;
  const command = join(bin, 'pg_ctl');
  const args = ['status', '-D', data];
  const [cmd, argv] = isRoot() ? ['runuser', ['-u', 'postgres', '--', command, ...args]] : [command, args];
  return spawnSync(cmd, argv, { cwd: dir, stdio: 'ignore' }).status === 0;
}

/**
 * Starts (or finds already running) the cluster in `dir` and returns `{ dir, port, url }`.
 * Idempotent: a running cluster is reused; an existing, stopped one is started again.
 */
export async function startTestPostgres(dir) {
  const bin = findPostgresBin();
  if (!bin) throw new PostgresNotInstalledError();
  const state = readState(dir);
  if (state && isRunning(bin, dir)) return { dir, port: state.port, url: adminUrl(state.port) };

  mkdirSync(dir, { recursive: true, mode: 0o700 });
  if (isRoot()) {
    const { uid, gid } = postgresUser();
    chownSync(dir, uid, gid);
  }
  const data = join(dir, 'data');
  if (!existsSync(join(data, 'PG_VERSION'))) {
    rmSync(data, { recursive: true, force: true });
    // trust for local socket and loopback TCP connections only (initdb writes those pg_hba lines)
    pgRun(bin, 'initdb', ['-D', data, '-U', 'postgres', '--auth=trust', '--encoding=UTF8', '--locale=C.UTF-8', '--no-sync'], dir);
  }
  let lastError;
  for (let attempt = 0; attempt < 3; attempt++) {
    const port = await freePort();
    const options = [
      `-c listen_addresses=127.0.0.1`,
      `-c port=${port}`,
      `-c unix_socket_directories=${dir}`,
      '-c fsync=off',
      '-c synchronous_commit=off',
      '-c full_page_writes=off',
      '-c max_connections=200',
      // a server time zone far from UTC (and from the API process's): Tacet pins its sessions to UTC
      '-c TimeZone=America/St_Johns',
    ].join(' ');
    try {
      pgRun(bin, 'pg_ctl', ['start', '-w', '-t', '60', '-D', data, '-l', join(dir, 'server.log'), '-o', options], dir);
      writeFileSync(join(dir, STATE_FILE), JSON.stringify({ port, bin }));
      return { dir, port, url: adminUrl(port) };
    } catch (error) {
      lastError = error; // most likely the port was taken in between: try another
    }
  }
  const log = existsSync(join(dir, 'server.log')) ? readFileSync(join(dir, 'server.log'), 'utf8').slice(-2000) : '';
  throw new Error(`${lastError.message}\n${log}`);
}

/** Stops the cluster in `dir` (if running) and deletes the folder. Idempotent. */
export function stopTestPostgres(dir) {
  if (!existsSync(dir)) return;
  const bin = readState(dir)?.bin ?? findPostgresBin();
  if (bin && isRunning(bin, dir)) {
    try {
      pgRun(bin, 'pg_ctl', ['stop', '-w', '-t', '60', '-m', 'immediate', '-D', join(dir, 'data')], dir);
    } catch (error) {
      console.error(error.message);
    }
  }
  rmSync(dir, { recursive: true, force: true });
}
