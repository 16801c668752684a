import { readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { buildTestApp, demo, DEMO_PASSWORD, signIn, type Client, type TestApp } from '../test-support/test-app';

/**
 * The client's component tests read the server's answers from tests/fixtures/records. This test makes
 * those answers again through the public API and fails when the fixture no longer matches them;
 * `UPDATE_RECORD_FIXTURE=1 npx vitest run server/reviews/record-fixture.test.ts` rewrites it.
 */
const FIXTURE = resolve('tests/fixtures/records/lead-check-standard.json');
const PEOPLE = ['analyst', 'qa', 'auditor'] as const;
const STAGES = ['draft', 'prepared', 'submitted', 'approved'] as const;
type Person = (typeof PEOPLE)[number];
type Detail = { current: { allowedActions: unknown } };

const ABOUT =
  "API answers of today's server for one invented Wellmere preparation (the demo lab's lead nitrate plan, seed 20261203), " +
  'captured through the public HTTP API as the demo analyst, QA and auditor: GET /api/auth/me for each, then ' +
  'GET /api/labs/1/preparations/1 after each step of its life (saved as a draft; bench readings recorded; submitted; ' +
  "approved by QA). Each stage holds the analyst's answer; the others' answers are the same but for what they may do, " +
  'kept in allowedActionsOf. Made by server/reviews/record-fixture.test.ts. Used by the client component tests as the ' +
  "server's answers; the numbers are the engine's, not a published check.";

/** JSON with one space of indent and each list of numbers on one line, as the fixture is kept. */
const formatted = (value: unknown) =>
  `${JSON.stringify(value, null, 1).replace(/\[\n\s*(-?[\d.e+-]+(?:,\n\s*-?[\d.e+-]+)*)\n\s*\]/g, (_all, items: string) => `[${items.split(/,\n\s*/).join(', ')}]`)}\n`;

let t: TestApp;
beforeEach(async () => {
  t = await buildTestApp();
});
afterEach(async () => {
  await t.close();
});

describe('the record fixture of the client tests', () => {
  it('is what the API answers today for the demo lead check standard at each stage, to each demo person', async () => {
    const labId = (await t.db('labs').first()).id as number;
    const clients = {} as Record<Person, Client>;
    const me = {} as Record<Person, unknown>;
    for (const person of PEOPLE) {
      clients[person] = await signIn(t.app, demo(person));
      me[person] = { ...(await clients[person].get('/api/auth/me').expect(200)).body, csrfToken: 'test-csrf-token' };
    }
    const { analyst, qa } = clients;
    const library = await libraryByCode(analyst, labId);
    const id = (
      await analyst
        .post(`/api/labs/${labId}/preparations`, {
          title: 'Pb 10 mg/L check standard',
          plan: leadPlan(library),
          seed: 20261203,
        })
        .expect(201)
    ).body.id as number;
    const v1 = (action: string) => `/api/labs/${labId}/preparations/${id}/versions/1/${action}`;
    const steps: Record<(typeof STAGES)[number], () => Promise<unknown>> = {
      draft: async () => undefined,
      prepared: () =>
        analyst
          .post(v1('readings'), {
            readings: [{ stepIndex: 0, actualMassG: 0.16042, tareG: 12.38115, grossG: 12.54157 }],
            deviations: 'Weighed 0.45 mg over the target.',
          })
          .expect(200),
      submitted: () => analyst.post(v1('submit'), {}).expect(200),
      approved: () =>
        qa
          .post(v1('approve'), { password: DEMO_PASSWORD, statement: 'Budget reviewed; equipment in calibration.' })
          .expect(200),
    };

    const captured: Record<string, unknown> = { about: ABOUT, me };
    const allowedActionsOf = { qa: {}, auditor: {} } as Record<Exclude<Person, 'analyst'>, Record<string, unknown>>;
    for (const stage of STAGES) {
      await steps[stage]();
      const answers = {} as Record<Person, Detail>;
      for (const person of PEOPLE)
        answers[person] = (await clients[person].get(`/api/labs/${labId}/preparations/${id}`).expect(200)).body;
      captured[stage] = answers.analyst;
      for (const person of ['qa', 'auditor'] as const) {
        const { allowedActions, ...current } = answers[person].current;
        // Everything but what the reader may do is the same for every reader.
        expect({ ...answers[person], current }).toEqual({
          ...answers.analyst,
          current: { ...answers.analyst.current, allowedActions: undefined },
        });
        allowedActionsOf[person][stage] = allowedActions;
      }
    }
    captured.allowedActionsOf = allowedActionsOf;

    if (process.env.UPDATE_RECORD_FIXTURE) writeFileSync(FIXTURE, formatted(captured));
    expect(JSON.parse(readFileSync(FIXTURE, 'utf8'))).toEqual(JSON.parse(JSON.stringify(captured)));
  });
});
