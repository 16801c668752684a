import type { Knex } from 'knex';

/** The demo account that is also the instance operator (server/db/seed-demo.ts seeds it so). */
const DEMO_OPERATOR_EMAIL = 'admin@wellmere-water.example';

/**
 * Accounts are global and labs manage memberships only:
 * - `users.operator`: the instance operator, held outside every lab's roles (disables accounts
 *   everywhere, reads the captured mail). An existing demo admin account becomes the operator.
 * - `invitations.revoked_at` / `revoked_by`: a lab admin can revoke a pending invitation.
 * - Captured reset mail was filed under the recipient's first lab; it concerns the account, not a
 *   lab, so it leaves every lab's delivery log.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => {
    t.boolean('operator').notNullable().defaultTo(false);
  });
  await knex('users').where({ email: DEMO_OPERATOR_EMAIL }).update({ operator: true });

  await knex.schema.alterTable('invitations', (t) => {
    t.string('revoked_at', 30).nullable();
    t.integer('revoked_by').nullable().references('users.id');
  });

  await knex('outbox').where('text_body', 'like', '%/reset-password/%').update({ lab_id: null });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('invitations', (t) => {
    t.dropForeign(['revoked_by']);
    t.dropColumn('revoked_by');
    t.dropColumn('revoked_at');
  });
  await knex.schema.alterTable('users', (t) => {
    t.dropColumn('operator');
  });
}
