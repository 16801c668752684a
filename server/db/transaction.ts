import type { Db } from './connection';

/**
 * Runs `work` in one database transaction and passes it the transaction to hand to repositories.
 * Services receive this instead of the database handle, so only repositories build queries.
 */
export type Transact = <T>(work: (trx: Db) => Promise<T>) => Promise<T>;

export const transactor =
  (db: Db): Transact =>
  (work) =>
    db.transaction((trx) => work(trx));
