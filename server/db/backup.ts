import { existsSync, mkdirSync, rmSync } from 'node:fs';
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

/**
 * Online, consistent copy of the live database through SQLite's backup API (pages are copied
 * while the app keeps running; the copy is one point in time). The copy is checked before it is kept.
 */
export async function backupDatabase(source: string, destination: string): Promise<{ pages: number }> {
  if (!existsSync(source)) throw new Error(`There is no database at ${source}.`);
  if (existsSync(destination)) throw new Error(`${destination} already exists; choose another name.`);
  mkdirSync(dirname(destination), { recursive: true });
  const db = new Database(source, { fileMustExist: true });
  try {
    const result = await db.backup(destination);
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
 * Replaces the database with a backup. Run it only while Dilutrace is stopped: the target's
 * write-ahead log is removed so no newer pages are replayed over the restored file.
 */
export async function restoreDatabase(backup: string, target: string): Promise<void> {
  const check = integrityCheck(backup);
  if (check !== 'ok') throw new Error(`The backup ${backup} failed its integrity check (${check}); the database was left as it was.`);
  mkdirSync(dirname(target), { recursive: true });
  for (const suffix of ['-wal', '-shm']) rmSync(`${target}${suffix}`, { force: true });
  const db = new Database(backup, { readonly: true, fileMustExist: true });
  try {
    await db.backup(target);
  } finally {
    db.close();
  }
  const after = integrityCheck(target);
  if (after !== 'ok') throw new Error(`The restored database failed its integrity check (${after}).`);
}
