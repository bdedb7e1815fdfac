/**
 * `npm run backup [-- <folder>]`: a consistent online backup of the SQLite database, safe while
 * the server runs. Reads TACET_DATA_DIR (default ./data) and DATABASE_URL like the server.
 *
 *   npm run backup                      → <data dir>/backups/tacet-<UTC time>Z.sqlite
 *   npm run backup -- /mnt/safe/tacet   → /mnt/safe/tacet/tacet-<UTC time>Z.sqlite
 */
import { join, resolve } from 'node:path';
import { SQLITE_FILE } from './config/database.config.js';
import { BackupError, backupSqlite } from './database/sqlite-backup.js';

const USAGE = `Usage: npm run backup [-- <folder>]

Writes a consistent copy of the Tacet SQLite database while the server keeps running.
  <folder>         where to write it (default: <data dir>/backups)
  TACET_DATA_DIR   the server's data folder (default: ./data)`;

function formatBytes(bytes: number): string {
  return bytes < 1024 * 1024 ? `${Math.ceil(bytes / 1024)} kB` : `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

async function main(argv: string[], env: NodeJS.ProcessEnv): Promise<number> {
  if (argv.includes('--help') || argv.includes('-h')) {
    console.log(USAGE);
    return 0;
  }
  if (argv.length > 1 || argv.some((arg) => arg.startsWith('-'))) {
    console.error(USAGE);
    return 2;
  }
  if (env.DATABASE_URL) {
    console.error(
      [
        'DATABASE_URL is set: Tacet keeps its data in PostgreSQL, which this command does not back up.',
        "Use PostgreSQL's own tool, which also takes a consistent copy while the server runs:",
        '  pg_dump --format=custom --file=tacet-$(date -u +%Y-%m-%dT%H-%M-%SZ).dump "$DATABASE_URL"',
        'and to restore it (server stopped):',
        '  pg_restore --clean --if-exists --dbname="$DATABASE_URL" tacet-<time>.dump',
      ].join('\n'),
    );
    return 2;
  }
  const dataDir = resolve(env.TACET_DATA_DIR || './data');
  const database = join(dataDir, SQLITE_FILE);
  const folder = resolve(argv[0] ?? join(dataDir, 'backups'));
  const { file, bytes } = await backupSqlite(database, folder);
  console.log(
    [
      `Backed up ${database}`,
      `       to ${file} (${formatBytes(bytes)}, integrity check ok)`,
      '',
      'To restore it:',
      '  1. stop the Tacet server',
      `  2. rm -f ${database}-wal ${database}-shm`,
      `  3. cp ${file} ${database}`,
      '  4. start the server again',
    ].join('\n'),
  );
  return 0;
}

main(process.argv.slice(2), process.env).then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error instanceof BackupError ? error.message : error);
    process.exit(1);
  },
);
