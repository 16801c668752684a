import type { Knex } from 'knex';
import * as foundation from '../../migrations/20261202010000_foundation';
import * as library from '../../migrations/20261202020000_library';
import * as preparations from '../../migrations/20261202030000_preparations';
import * as reviews from '../../migrations/20261202040000_reviews';
import * as readings from '../../migrations/20261202050000_readings';
import * as accountsAndOperator from '../../migrations/20261203010000_accounts_and_operator';
import * as authAttempts from '../../migrations/20261203020000_auth_attempts';
import * as recordIntegrity from '../../migrations/20261203030000_record_integrity';

/**
 * Migrations imported statically, so they run the same under tsx and Vitest
 * (Knex's file loader cannot import .ts under Vitest). Add each new migration here, in order.
 */
const migrations: Record<string, Knex.Migration> = {
  '20261202010000_foundation': foundation,
  '20261202020000_library': library,
  '20261202030000_preparations': preparations,
  '20261202040000_reviews': reviews,
  '20261202050000_readings': readings,
  '20261203010000_accounts_and_operator': accountsAndOperator,
  '20261203020000_auth_attempts': authAttempts,
  '20261203030000_record_integrity': recordIntegrity,
};

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(migrations).sort(),
  getMigrationName: (name) => name,
  getMigration: async (name) => migrations[name],
};
