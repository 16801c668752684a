import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { agentFor, buildTestApp, demo, signIn, type TestApp } from '../test-support/test-app';

let t: TestApp;
let labId: number;
beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
});
afterEach(async () => {
  await t.close();
});

describe('audit trail', () => {
  it('lists sign-ins and failures for auditors and QA, filtered, and refuses analysts', async () => {
    await signIn(t.app, demo('analyst'));
    const anon = await agentFor(t.app);
    await anon.post('/api/auth/login', { email: demo('analyst'), password: 'wrong-password' }).expect(401);
    const auditor = await signIn(t.app, demo('auditor'));
    const page = (await auditor.get(`/api/labs/${labId}/audit-events`).expect(200)).body;
    const actions = page.events.map((e: { action: string }) => e.action);
    expect(actions).toEqual(expect.arrayContaining(['auth.sign_in', 'auth.sign_in_failed', 'lab.seeded']));
    const failures = (await auditor.get(`/api/labs/${labId}/audit-events?action=auth.sign_in_failed`).expect(200)).body;
    expect(failures.total).toBe(1);
    expect(failures.events[0].summary).toContain(demo('analyst'));
    const byActor = (await auditor.get(`/api/labs/${labId}/audit-events?actor=Okonjo&action=auth.sign_in`).expect(200))
      .body;
    expect(byActor.events.length).toBeGreaterThan(0);
    expect(new Set(byActor.events.map((e: { actor: string }) => e.actor))).toEqual(new Set(['Dev Okonjo']));

    const seeded = (await auditor.get(`/api/labs/${labId}/audit-events?entityType=lab&entityId=${labId}`).expect(200))
      .body;
    expect(seeded.events.map((e: { action: string }) => e.action)).toEqual(['lab.seeded']);

    const csv = await auditor.get(`/api/labs/${labId}/audit-events.csv?action=auth`).expect(200);
    expect(csv.headers['content-disposition']).toMatch(/attachment/);
    expect(csv.text.split('\n')[0]).toBe('id,time_utc,actor,action,entity_type,entity_id,summary,before,after');

    await (await signIn(t.app, demo('qa'))).get(`/api/labs/${labId}/audit-events`).expect(200);
    await (await signIn(t.app, demo('analyst2'))).get(`/api/labs/${labId}/audit-events`).expect(403);
  });

  it('refuses a date range that ends before it starts, naming the field', async () => {
    const auditor = await signIn(t.app, demo('auditor'));
    const res = await auditor.get(`/api/labs/${labId}/audit-events?from=2026-12-05&to=2026-12-01`).expect(400);
    expect(res.body.error.details[0].path).toBe('query.from');
  });

  it('cannot be changed or deleted, even from inside the database layer', async () => {
    await expect(t.db('audit_events').update({ summary: 'rewritten' })).rejects.toThrow(/append-only/);
    await expect(t.db('audit_events').delete()).rejects.toThrow(/append-only/);
  });
});
