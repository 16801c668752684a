/**
 * The id of a row from Knex's `insert(...).returning('id')`: better-sqlite3 and pg both return
 * `{ id }` objects, older drivers a bare number.
 */
export const insertedId = (row: unknown): number =>
  Number(typeof row === 'object' && row !== null ? (row as { id: number }).id : row);
