import { databaseName, databaseTarget, loadEnv } from '../config/env';
import { openDatabase } from '../db/connection';
import { verifyRecords } from '../audit/verify-records';

/**
 * `npm run verify`: checks the audit trail's hash chain and every approved record's hashes, and
 * names each row that breaks (table, id, what differs). Exit code 1 when anything breaks.
 */
const env = loadEnv();
const db = await openDatabase(databaseTarget(env));
try {
  const { events, versions, breaks } = await verifyRecords(db);
  for (const b of breaks) console.error(`BROKEN ${b.table} id ${b.id}: ${b.problem}`);
  if (breaks.length === 0)
    console.log(
      `Intact: ${events} audit events form one unbroken chain, and all ${versions} approved versions match their signed hashes (${databaseName(env)}).`,
    );
  else {
    console.error(
      `${breaks.length} problem(s) found in ${databaseName(env)}: the records above have been altered outside Dilutrace.`,
    );
    process.exitCode = 1;
  }
} finally {
  await db.destroy();
}
