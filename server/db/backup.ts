import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { dirname } from 'node:path';
import Database from 'better-sqlite3';

/** PRAGMA integrity_check of a database file; 'ok' when sound. */
export function integrityCheck(file: string): string {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    return (db.pragma('integrity_check', { simple: true }) as string) ?? 'no answer';
  } finally {
    db.close();
  }
}

/** The file a running server writes its process id to, beside the database (only to name it in messages). */
export const pidFileOf = (databaseFile: string) => `${databaseFile}.pid`;

/** Refused because a process has the database open. */
export class DatabaseInUseError extends Error {}

/** The process id in the pid file, if that process is still alive. */
function livePid(databaseFile: string): number | null {
  try {
    const pid = Number(readFileSync(pidFileOf(databaseFile), 'utf8').trim());
    if (!Number.isInteger(pid) || pid <= 0) return null;
    process.kill(pid, 0);
    return pid;
  } catch {
    return null;
  }
}

/**
 * Throws DatabaseInUseError while any process has the database open. Every connection to a WAL
 * database holds a shared lock on it for as long as it is open (the server keeps one open from
 * start to stop), and leaving WAL mode needs the only connection: so switching this probe to
 * rollback journaling succeeds exactly when nobody else has the file open. The lock belongs to the
 * process, so a crashed server leaves nothing stale behind.
 */
export function assertNotInUse(file: string): void {
  if (!existsSync(file)) return;
  const probe = new Database(file, { fileMustExist: true, timeout: 200 });
  try {
    probe.pragma('journal_mode = DELETE');
  } catch (error) {
    if (!/^SQLITE_(BUSY|LOCKED)/.test((error as { code?: string }).code ?? '')) throw error;
    const pid = livePid(file);
    throw new DatabaseInUseError(
      `The database ${file} is open in a running Dilutrace${pid ? ` (process ${pid})` : ' or another program'}, so it was not restored. ` +
        `Stop it first: press Ctrl+C in the terminal that runs it${pid ? `, or run kill -TERM ${pid}` : ''} (systemctl stop … if it runs as a service), wait until it has exited, then run the restore again. Nothing was changed.`,
    );
  } finally {
    probe.close();
  }
}

/** Removes what lets someone act as a signed-in user: live sessions and the stored session secret. */
function removeSessionKeys(db: Database.Database): void {
  db.exec("DELETE FROM sessions; DELETE FROM app_settings WHERE key = 'session_secret';");
}

/**
 * Online, consistent copy of the live database through SQLite's backup API (pages are copied
 * while the app keeps running; the copy is one point in time). The copy leaves out the sessions
 * and the session secret (a backup must not let its reader sign in as anyone), is compacted so
 * nothing of them stays in free pages, and is checked before it is kept.
 */
export async function backupDatabase(source: string, destination: string): Promise<{ pages: number }> {
  if (!existsSync(source)) throw new Error(`There is no database at ${source}.`);
  if (existsSync(destination)) throw new Error(`${destination} already exists; choose another name.`);
  mkdirSync(dirname(destination), { recursive: true });
  const db = new Database(source, { fileMustExist: true });
  try {
    const result = await db.backup(destination);
    const copy = new Database(destination, { fileMustExist: true });
    try {
      copy.pragma('journal_mode = DELETE');
      removeSessionKeys(copy);
      copy.exec('VACUUM');
    } finally {
      copy.close();
    }
    const check = integrityCheck(destination);
    if (check !== 'ok') {
      rmSync(destination, { force: true });
      throw new Error(`The backup failed its integrity check (${check}); nothing was kept.`);
    }
    return { pages: result.totalPages };
  } finally {
    db.close();
  }
}

/**
 * Replaces the database with a backup. Refused while any process has the database open. The
 * target's write-ahead log is removed so no newer pages are replayed over the restored file, and
 * sessions and the session secret are removed from the restored file (a backup made before they
 * were left out still holds them): the next start makes a new secret, so no cookie from before works.
 */
export async function restoreDatabase(backup: string, target: string): Promise<void> {
  const check = integrityCheck(backup);
  if (check !== 'ok')
    throw new Error(`The backup ${backup} failed its integrity check (${check}); the database was left as it was.`);
  assertNotInUse(target);
  mkdirSync(dirname(target), { recursive: true });
  for (const suffix of ['-wal', '-shm']) rmSync(`${target}${suffix}`, { force: true });
  const db = new Database(backup, { readonly: true, fileMustExist: true });
  try {
    await db.backup(target);
  } finally {
    db.close();
  }
  const restored = new Database(target, { fileMustExist: true });
  try {
    removeSessionKeys(restored);
  } finally {
    restored.close();
  }
  const after = integrityCheck(target);
  if (after !== 'ok') throw new Error(`The restored database failed its integrity check (${after}).`);
}
