import { randomBytes } from 'node:crypto';
import type { Db } from './connection';

/** Returns the stored session secret, generating and storing one on first start. */
export async function sessionSecret(db: Db): Promise<string> {
  const row: { value: string } | undefined = await db('app_settings').where({ key: 'session_secret' }).first();
  if (row) return row.value;
  const value = randomBytes(48).toString('base64url');
  await db('app_settings').insert({ key: 'session_secret', value }).onConflict('key').ignore();
  const stored: { value: string } = await db('app_settings').where({ key: 'session_secret' }).first();
  return stored.value;
}
