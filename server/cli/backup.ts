import { join, dirname } from 'node:path';
import { loadEnv } from '../config/env';
import { backupDatabase } from '../db/backup';
import { systemClock } from '../lib/clock';

/** `npm run backup [-- <file>]`: an online, consistent copy of the database (default data/backups/…). */
const env = loadEnv();
if (env.DATABASE_URL) {
  console.error(
    'DATABASE_URL is set: back up PostgreSQL with its own tools (pg_dump), and copy DILUTRACE_FILES/certificates too.',
  );
  process.exit(2);
}
const stamp = systemClock.now().toISOString().replace(/[:.]/g, '-');
const destination = process.argv[2] ?? join(dirname(env.DILUTRACE_DB), 'backups', `dilutrace-${stamp}.sqlite`);
try {
  const { pages } = await backupDatabase(env.DILUTRACE_DB, destination);
  console.log(
    `Backed up ${env.DILUTRACE_DB} to ${destination} (${pages} pages, integrity ok; sessions and the session secret left out).`,
  );
  console.log('Certificates are files: copy the certificates folder beside the database too.');
} catch (error) {
  console.error((error as Error).message);
  process.exitCode = 1;
}
