import { certificateDir, databaseName, databaseTarget, loadEnv } from '../config/env';
import { systemClock } from '../lib/clock';
import { openDatabase } from './connection';
import { SeedRefusedError, seedDemoLab } from './seed-demo';

/** `npm run seed`: seeds the demo lab into the configured database, only if it has no users. */
const env = loadEnv();
const db = await openDatabase(databaseTarget(env));
try {
  await seedDemoLab(db, {
    password: env.DILUTRACE_DEMO_PASSWORD,
    now: systemClock.now(),
    certificateDir: certificateDir(env),
  });
  console.log(`Demo lab seeded into ${databaseName(env)}.`);
} catch (error) {
  if (!(error instanceof SeedRefusedError)) throw error;
  console.error(error.message);
  process.exitCode = 1;
} finally {
  await db.destroy();
}
