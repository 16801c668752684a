import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import knex from 'knex';
import { describe, expect, it } from 'vitest';
import type { EquipmentItem } from '../../shared/contracts/library';
import { integrityCheck } from '../../server/db/backup';
import { leadPlan } from '../../server/test-support/demo-plans';
import { httpClient, startServer } from './server-process';

const PASSWORD = 'crash-test-password-1';
const RUNS = 3;

/**
 * Kills the server with SIGKILL in the middle of a burst of writes, restarts it on the same file,
 * and checks that SQLite is sound, every write the server acknowledged is there, and no item or
 * preparation was left half-written (each has its revision / version).
 */
// SQLite's durability (WAL, synchronous=FULL, integrity_check); PostgreSQL's is PostgreSQL's own.
describe.runIf(!process.env.DATABASE_URL)(
  'a SIGKILL in the middle of writes loses nothing that was acknowledged',
  () => {
    it(`survives ${RUNS} crashes`, async () => {
      const file = join(mkdtempSync(join(tmpdir(), 'dilutrace-crash-')), 'crash.sqlite');
      const env = { DILUTRACE_DB: file, DILUTRACE_SEED_DEMO: '1', DILUTRACE_DEMO_PASSWORD: PASSWORD };
      const acknowledged: string[] = [];
      const acknowledgedPlans: string[] = [];
      for (let run = 0; run < RUNS; run += 1) {
        const server = await startServer(env);
        const client = await httpClient(server.url);
        const { activeLabId } = await client.signIn('qa@wellmere-water.example', PASSWORD);
        const library = new Map(
          ((await client.request('GET', `/api/labs/${activeLabId}/equipment`)).body as EquipmentItem[]).map((item) => [
            item.code,
            item,
          ]),
        );
        const flask = library.get('VF-100-A')!;
        const analyst = await httpClient(server.url);
        await analyst.signIn('analyst@wellmere-water.example', PASSWORD);
        // Warm the compute worker so preparations are acknowledged during the burst, not only items.
        expect(
          (
            await analyst.request('POST', `/api/labs/${activeLabId}/preparations`, {
              title: `WARM-${run}`,
              plan: leadPlan(library),
            })
          ).status,
        ).toBe(201);
        const writes = Array.from({ length: 400 }, async (_, i) => {
          const code = `CRASH-${run}-${i}`;
          try {
            if (i % 4 === 3) {
              const res = await analyst.request('POST', `/api/labs/${activeLabId}/preparations`, {
                title: code,
                plan: leadPlan(library),
              });
              if (res.status === 201) acknowledgedPlans.push(code);
              return;
            }
            const res = await client.request('POST', `/api/labs/${activeLabId}/equipment`, {
              kind: 'flask',
              data: { ...flask.current.data, code },
            });
            if (res.status === 201) acknowledged.push(code);
          } catch {
            // the connection died with the process
          }
        });
        // Kill once the burst is well under way.
        const deadline = Date.now() + 20_000;
        const ackedThisRun = (list: string[]) => list.filter((c) => c.startsWith(`CRASH-${run}-`)).length;
        while ((ackedThisRun(acknowledged) < 20 || ackedThisRun(acknowledgedPlans) < 3) && Date.now() < deadline)
          await new Promise((r) => setTimeout(r, 5));
        server.process.kill('SIGKILL');
        await Promise.allSettled(writes);
        await new Promise((resolve) => {
          if (server.process.exitCode !== null || server.process.signalCode !== null) resolve(null);
          else server.process.once('exit', resolve);
        });
        expect(server.process.signalCode).toBe('SIGKILL');
      }

      expect(integrityCheck(file)).toBe('ok');
      // Restart on the same file: migrations and start-up must accept the crashed database.
      const server = await startServer(env);
      server.process.kill('SIGTERM');
      const db = knex({ client: 'better-sqlite3', connection: { filename: file }, useNullAsDefault: true });
      try {
        const codes = new Set(
          (await db('equipment_items').whereLike('code', 'CRASH-%').select('code')).map(
            (r: { code: string }) => r.code,
          ),
        );
        expect(acknowledged.length).toBeGreaterThan(0);
        const missing = acknowledged.filter((code) => !codes.has(code));
        expect(missing).toEqual([]);
        const halfWritten = await db('equipment_items as i')
          .leftJoin('equipment_revisions as r', 'r.id', 'i.current_revision_id')
          .whereNull('r.id')
          .select('i.code');
        expect(halfWritten).toEqual([]);
        const orphanRevisions = await db('equipment_revisions as r')
          .leftJoin('equipment_items as i', 'i.id', 'r.item_id')
          .whereNull('i.id')
          .select('r.id');
        expect(orphanRevisions).toEqual([]);
        const titles = new Set(
          (await db('preparations').whereLike('title', 'CRASH-%').select('title')).map(
            (r: { title: string }) => r.title,
          ),
        );
        expect(acknowledgedPlans.length).toBeGreaterThan(0);
        expect(acknowledgedPlans.filter((title) => !titles.has(title))).toEqual([]);
        const versionless = await db('preparations as p')
          .leftJoin('preparation_versions as v', 'v.preparation_id', 'p.id')
          .whereNull('v.id')
          .select('p.title');
        expect(versionless).toEqual([]);
        console.log(
          `crash test: ${RUNS} SIGKILLs survived, ${acknowledged.length} acknowledged items and ${acknowledgedPlans.length} acknowledged preparations all present, ${codes.size} items and ${titles.size} preparations written`,
        );
      } finally {
        await db.destroy();
      }
    }, 120_000);
  },
);
