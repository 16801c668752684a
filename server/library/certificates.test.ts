import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { buildTestApp, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

let t: TestApp;
let labId: number;
let qa: Client;
let itemId: number;
beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  qa = await signIn(t.app, demo('qa'));
  const flask = {
    code: 'T-VF-25',
    nominalMl: 25,
    glassClass: 'A',
    toleranceMl: 0.03,
    toleranceDistribution: null,
    fillRepeatabilityMl: 0.01,
    calibrationTemperatureC: 20,
  };
  itemId = (await qa.post(url('/equipment'), { kind: 'flask', data: flask }).expect(201)).body.id;
});
afterEach(async () => {
  await t.close();
});
const url = (path: string) => `/api/labs/${labId}${path}`;

const cleanPdf = Buffer.from('%PDF-1.4\n1 0 obj<</Type/Catalog>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n');
const scriptedPdf = Buffer.from(
  '%PDF-1.4\n1 0 obj<</Type/Catalog/OpenAction 2 0 R>>endobj\n2 0 obj<</S/JavaScript/JS(app.alert(1))>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
);
/** The same action with its names written in PDF's #xx escapes, as evasive files do. */
const escapedScriptPdf = Buffer.from(
  '%PDF-1.4\n1 0 obj<</Type/Catalog/OpenAction<</S/J#61vaScript/J#53(app.alert(1))>>>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
);

const upload = (content: Buffer, filename: string, item = itemId) =>
  qa.agent
    .post(url(`/equipment/${item}/revisions/1/certificates`))
    .set('x-csrf-token', qa.token)
    .attach('file', content, { filename, contentType: 'application/octet-stream' });

describe('certificate names', () => {
  it('shows and serves a file under the extension of its sniffed type, whatever it was called', async () => {
    const res = await upload(cleanPdf, 'x.html').expect(201);
    expect(res.body.originalName).toBe('x.pdf');
    expect((await t.db('certificates').where({ id: res.body.id }).first()).stored_name).toMatch(/^[0-9a-f-]{36}\.pdf$/);
    const download = await qa.get(url(`/certificates/${res.body.id}`)).expect(200);
    expect(download.headers['content-disposition']).toBe('attachment; filename=x.pdf');
    expect(download.headers['content-type']).toMatch(/^application\/pdf/);
  });

  it('keeps a non-ASCII name in UTF-8, for display and download', async () => {
    const name = 'Kalibrierschein Prüfung – 25 µL Ø №7.pdf';
    const res = await upload(cleanPdf, name).expect(201);
    expect(res.body.originalName).toBe(name);
    const download = await qa.get(url(`/certificates/${res.body.id}`)).expect(200);
    expect(download.headers['content-disposition']).toContain(
      `filename*=UTF-8''${encodeURIComponent(name).replace(/'/g, '%27')}`,
    );
  });

  it('drops path parts and bidi overrides, and caps the length', async () => {
    const res = await upload(cleanPdf, `..\\..\\etc/report\u202Efdp.exe\u202C${'a'.repeat(300)}.pdf`).expect(201);
    const shown: string = res.body.originalName;
    expect(shown).toBe(`reportfdp.exe${'a'.repeat(120 - 'reportfdp.exe'.length - '.pdf'.length)}.pdf`);
    expect(shown.length).toBe(120);
  });

  it('answers 400, not 500, to a form whose file name has control characters', async () => {
    const res = await upload(cleanPdf, 'report\u0007.pdf').expect(400);
    expect(res.body.error).toMatchObject({
      code: 'upload_invalid',
      message: expect.stringMatching(/could not be read/),
    });
  });
});

describe('certificates that hold JavaScript', () => {
  it('flags a PDF with a JavaScript open action, shows the flag in the library and audits it', async () => {
    const flagged = (await upload(scriptedPdf, 'cert.pdf').expect(201)).body;
    expect(flagged.containsScript).toBe(true);
    const escaped = (await upload(escapedScriptPdf, 'cert2.pdf').expect(201)).body;
    expect(escaped.containsScript).toBe(true);
    const clean = (await upload(cleanPdf, 'cert3.pdf').expect(201)).body;
    expect(clean.containsScript).toBe(false);
    const detail = (await qa.get(url(`/equipment/${itemId}`)).expect(200)).body;
    expect(
      detail.certificates.map((c: { originalName: string; containsScript: boolean }) => [
        c.originalName,
        c.containsScript,
      ]),
    ).toEqual([
      ['cert3.pdf', false],
      ['cert2.pdf', true],
      ['cert.pdf', true],
    ]);
    const events = await t.db('audit_events').where({ action: 'library.certificate_flagged' }).orderBy('id');
    expect(events.map((e: { entity_id: string; summary: string }) => [e.entity_id, e.summary])).toEqual([
      [String(itemId), expect.stringMatching(/cert\.pdf .*JavaScript/)],
      [String(itemId), expect.stringMatching(/cert2\.pdf .*JavaScript/)],
    ]);
  });
});

describe('retired items', () => {
  it('take no new certificates', async () => {
    await qa.post(url(`/equipment/${itemId}/retire`), { reason: 'Chipped neck' }).expect(200);
    const res = await upload(cleanPdf, 'late.pdf').expect(409);
    expect(res.body.error).toMatchObject({
      code: 'item_retired',
      message: expect.stringMatching(/T-VF-25 is retired/),
    });
    expect(await t.db('certificates').where({ item_id: itemId })).toEqual([]);
  });
});
