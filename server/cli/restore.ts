import { loadEnv } from '../config/env';
import { DatabaseInUseError, restoreDatabase } from '../db/backup';

/**
 * `npm run restore -- <backup file>`: replaces DILUTRACE_DB with the backup. Refused (exit code 3)
 * while Dilutrace or anything else has the database open.
 */
const env = loadEnv();
if (env.DATABASE_URL) {
  console.error('DATABASE_URL is set: restore PostgreSQL with its own tools (pg_restore or psql).');
  process.exit(2);
}
const backup = process.argv[2];
if (!backup) {
  console.error('Name the backup file: npm run restore -- data/backups/dilutrace-….sqlite');
  process.exit(2);
}
try {
  await restoreDatabase(backup, env.DILUTRACE_DB);
  console.log(
    `Restored ${env.DILUTRACE_DB} from ${backup} (integrity ok). Everyone signs in again. Start Dilutrace again.`,
  );
} catch (error) {
  console.error((error as Error).message);
  process.exitCode = error instanceof DatabaseInUseError ? 3 : 1;
}
