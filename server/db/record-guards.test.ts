import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { approvedLeadStandard } from '../test-support/demo-plans';
import { buildTestApp, demo, DEMO_PASSWORD, signIn, type TestApp } from '../test-support/test-app';

let t: TestApp;
beforeEach(async () => {
  t = await buildTestApp();
});
afterEach(async () => {
  await t.close();
});

/** Rewrites a stored row through SQLite's INSERT OR REPLACE (a delete of the old row, then an insert). */
async function replaceRow(table: string, id: number, change: Record<string, unknown>) {
  const row = { ...(await t.db(table).where({ id }).first()), ...change };
  const columns = Object.keys(row);
  await t.db.raw(
    `insert or replace into ${table} (${columns.join(', ')}) values (${columns.map(() => '?').join(', ')})`,
    columns.map((c) => row[c]),
  );
}

// REPLACE is SQLite's own statement; PostgreSQL has no such bypass (its upsert is an UPDATE, which the guards refuse).
describe.runIf(!process.env.DATABASE_URL)('INSERT OR REPLACE on a record table', () => {
  it('is refused on an approved version, a review and an audit event, leaving each row as it was', async () => {
    const labId = (await t.db('labs').first()).id;
    const analyst = await signIn(t.app, demo('analyst'));
    const qa = await signIn(t.app, demo('qa'));
    const id = await approvedLeadStandard(analyst, qa, labId, DEMO_PASSWORD);

    const version = await t.db('preparation_versions').where({ preparation_id: id, number: 1 }).first();
    await expect(replaceRow('preparation_versions', version.id, { result_statement: 'forged' })).rejects.toThrow(
      /immutable/,
    );
    expect(await t.db('preparation_versions').where({ id: version.id }).first()).toEqual(version);

    const review = await t.db('version_reviews').where({ version_id: version.id, action: 'approved' }).first();
    await expect(replaceRow('version_reviews', review.id, { comment: 'forged' })).rejects.toThrow(/append-only/);
    expect(await t.db('version_reviews').where({ id: review.id }).first()).toEqual(review);

    const event = await t.db('audit_events').orderBy('id').first();
    await expect(replaceRow('audit_events', event.id, { summary: 'forged' })).rejects.toThrow(/append-only/);
    expect(await t.db('audit_events').where({ id: event.id }).first()).toEqual(event);
  });
});
