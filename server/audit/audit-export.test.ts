import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { appendAuditEventsForTest } from '../test-support/audit-events';
import { buildTestApp, demo, signIn, type TestApp } from '../test-support/test-app';
import { verifyRecords } from './verify-records';

/** More than the 100 000 rows the export used to stop at without a word. */
const EVENTS = 100_123;

let t: TestApp;
let labId: number;
beforeAll(async () => {
  t = await buildTestApp();
  labId = Number((await t.db('labs').first()).id);
  const at = t.clock.now().toISOString();
  await appendAuditEventsForTest(
    t.db,
    Array.from({ length: EVENTS }, (_, i) => ({
      lab_id: labId,
      actor_user_id: null,
      action: 'bulk.checked',
      entity_type: 'check',
      entity_id: String(i + 1),
      // The first event's summary starts like a spreadsheet formula: the stream must neutralise it too.
      summary: i === 0 ? '=HYPERLINK("http://example.test")' : `Bulk check ${i + 1}`,
      before_json: null,
      after_json: null,
      created_at: at,
    })),
  );
}, 60_000);
afterAll(async () => {
  await t.close();
});

describe('audit CSV export', () => {
  it('streams every matching event, past 100 000 rows, newest first, cells neutralised', async () => {
    const auditor = await signIn(t.app, demo('auditor'));
    const response = await auditor.get(`/api/labs/${labId}/audit-events.csv?action=bulk.`).expect(200);
    expect(response.headers['content-type']).toMatch(/^text\/csv/);
    const [header, ...rows] = parse(response.text) as string[][];
    expect(header).toEqual([
      'id',
      'time_utc',
      'actor',
      'action',
      'entity_type',
      'entity_id',
      'summary',
      'before',
      'after',
    ]);
    expect(rows).toHaveLength(EVENTS);
    // Newest first, each event once: entity ids run from EVENTS down to 1 with no gap or repeat.
    expect(rows[0][5]).toBe(String(EVENTS));
    expect(rows.at(-1)?.[5]).toBe('1');
    expect(new Set(rows.map((row) => row[5])).size).toBe(EVENTS);
    expect(rows.at(-1)?.[6]).toBe(`'=HYPERLINK("http://example.test")`);
  }, 60_000);

  it('dates the file by the app clock, not the machine clock', async () => {
    const auditor = await signIn(t.app, demo('auditor'));
    const response = await auditor.get(`/api/labs/${labId}/audit-events.csv?action=lab.seeded`).expect(200);
    // The test clock stands at 2026-12-02 whatever day the machine thinks it is.
    expect(response.headers['content-disposition']).toBe('attachment; filename=dilutrace-audit-2026-12-02.csv');
    const [header, ...rows] = parse(response.text) as string[][];
    expect(header[0]).toBe('id');
    expect(rows.map((row) => row[3])).toEqual(['lab.seeded']);
  });

  it('leaves the hash chain whole (the bulk events are chained like any other)', async () => {
    const result = await verifyRecords(t.db);
    expect(result.events).toBeGreaterThan(EVENTS);
    expect(result.breaks).toEqual([]);
  }, 60_000);
});
