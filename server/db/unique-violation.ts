/**
 * True when `error` is a unique-constraint violation on `table.column`, on SQLite (better-sqlite3:
 * SQLITE_CONSTRAINT_UNIQUE naming "table.column") or PostgreSQL (23505 on Knex's "table_column_unique").
 */
export function isUniqueViolation(error: unknown, table: string, column: string): boolean {
  const { code, message, constraint } = (error ?? {}) as { code?: string; message?: string; constraint?: string };
  if (code === 'SQLITE_CONSTRAINT_UNIQUE') return (message ?? '').includes(`${table}.${column}`);
  return code === '23505' && constraint === `${table}_${column}_unique`;
}
