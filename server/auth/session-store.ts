import session from 'express-session';
import type { Db } from '../db/connection';

const DAY_MS = 24 * 60 * 60 * 1000;

/** express-session store on the `sessions` table, so sign-ins survive a restart. */
export class DatabaseSessionStore extends session.Store {
  constructor(
    private readonly db: Db,
    private readonly now: () => number,
  ) {
    super();
  }

  private expiry(sess: session.SessionData): number {
    const expires = sess.cookie?.expires;
    return expires ? new Date(expires).getTime() : this.now() + DAY_MS;
  }

  override get(sid: string, callback: (err: unknown, session?: session.SessionData | null) => void): void {
    this.db('sessions')
      .where({ sid })
      .first()
      .then((row: { sess: string; expires_at: number } | undefined) => {
        if (!row || Number(row.expires_at) <= this.now()) return callback(null, null);
        callback(null, JSON.parse(row.sess) as session.SessionData);
      })
      .catch((error) => callback(error));
  }

  override set(sid: string, sess: session.SessionData, callback?: (err?: unknown) => void): void {
    this.db('sessions')
      .insert({ sid, sess: JSON.stringify(sess), expires_at: this.expiry(sess) })
      .onConflict('sid')
      .merge()
      .then(() => callback?.())
      .catch((error) => callback?.(error));
  }

  override destroy(sid: string, callback?: (err?: unknown) => void): void {
    this.db('sessions')
      .where({ sid })
      .delete()
      .then(() => callback?.())
      .catch((error) => callback?.(error));
  }

  override touch(sid: string, sess: session.SessionData, callback?: () => void): void {
    this.db('sessions')
      .where({ sid })
      .update({ expires_at: this.expiry(sess) })
      .then(() => callback?.())
      .catch(() => callback?.());
  }

  /** Removes expired sessions; called at start-up. */
  async prune(): Promise<number> {
    return this.db('sessions').where('expires_at', '<=', this.now()).delete();
  }

  /** Ends every session of one user (deactivation, password reset). */
  async destroyForUser(userId: number): Promise<void> {
    const rows: { sid: string; sess: string }[] = await this.db('sessions').select('sid', 'sess');
    const doomed = rows.filter(
      (row) => (JSON.parse(row.sess) as { passport?: { user?: number } }).passport?.user === userId,
    );
    if (doomed.length > 0)
      await this.db('sessions')
        .whereIn(
          'sid',
          doomed.map((row) => row.sid),
        )
        .delete();
  }
}
