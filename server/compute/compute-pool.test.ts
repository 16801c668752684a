import { readFileSync } from 'node:fs';
import { afterEach, describe, expect, it } from 'vitest';
import { DEFAULT_LAB_POLICY } from '../../shared/contracts/library';
import { PlanError } from '../../shared/uncertainty';
import { AppError } from '../lib/errors';
import { createComputePool, type Computer, type SnapshotInput } from './compute-pool';

const plan = JSON.parse(
  readFileSync(new URL('../../tests/fixtures/plans/selenium-working-standard.json', import.meta.url), 'utf8'),
) as Record<string, unknown>;
const job = (trials: number): SnapshotInput => ({
  plan,
  items: [],
  seed: 1,
  computedAt: '2026-12-03T10:00:00.000Z',
  policy: DEFAULT_LAB_POLICY,
  trials,
});
const HEAVY = 1_000_000;

/** The refusal a job ended with (an AppError or PlanError), or a failure if it succeeded. */
async function refusal(promise: Promise<unknown>): Promise<Error> {
  try {
    await promise;
  } catch (error) {
    return error as Error;
  }
  throw new Error('expected the job to be refused');
}

let pool: Computer | undefined;
afterEach(async () => {
  await pool?.close();
  pool = undefined;
});

describe('compute pool (piscina worker threads)', () => {
  it('computes a snapshot in a worker thread and carries an engine refusal back as a PlanError', async () => {
    pool = createComputePool({ threads: 1 });
    expect((await pool.snapshot(1, job(1000))).trials).toBe(1000);
    const error = await refusal(pool.snapshot(1, { ...job(1000), plan: { ...plan, steps: [] } }));
    expect(error).toBeInstanceOf(PlanError);
    expect((error as PlanError).path).toEqual(['steps']);
    expect(pool.stats().active).toBe(0);
  });

  it('one lab flooding the pool is refused past its share, and another lab still gets its job done', async () => {
    pool = createComputePool({ threads: 1, jobsPerLab: 2, queuedJobs: 8 });
    const stop = new AbortController();
    const flood = Array.from({ length: 5 }, () =>
      pool!.snapshot(1, job(HEAVY), stop.signal).catch((error: unknown) => error),
    );
    const other = pool.snapshot(2, job(1000));
    expect((await other).trials).toBe(1000);
    stop.abort();
    const outcomes = (await Promise.all(flood)) as AppError[];
    expect(outcomes.filter((outcome) => outcome instanceof AppError && outcome.code === 'compute_busy')).toHaveLength(
      3,
    );
    expect(outcomes[4].kind).toBe('unavailable');
    expect(outcomes[4].message).toMatch(/Your lab already has 2 computations/);
  });

  it('serves waiting jobs in turns by lab: a lab that queued first does not hold another lab behind all its jobs', async () => {
    pool = createComputePool({ threads: 1, jobsPerLab: 4 });
    const finished: string[] = [];
    const track = (name: string, lab: number, trials: number) =>
      pool!.snapshot(lab, job(trials)).then(() => void finished.push(name));
    await Promise.all([
      track('A1', 1, HEAVY / 4),
      track('A2', 1, HEAVY / 4),
      track('A3', 1, HEAVY / 4),
      track('A4', 1, HEAVY / 4),
      track('B1', 2, 1000),
    ]);
    // One thread: first come, first served would finish B1 last. In turns, B1 runs as soon as A1 has finished.
    expect(finished).toEqual(['A1', 'B1', 'A2', 'A3', 'A4']);
    expect(finished).toHaveLength(5);
  });

  it('a full queue refuses new jobs from any lab', async () => {
    pool = createComputePool({ threads: 1, jobsPerLab: 10, queuedJobs: 1 });
    const stop = new AbortController();
    const held = [pool.snapshot(1, job(HEAVY), stop.signal), pool.snapshot(2, job(HEAVY), stop.signal)].map((p) =>
      p.catch((error: unknown) => error),
    );
    const error = await refusal(pool.snapshot(3, job(1000)));
    expect(error).toBeInstanceOf(AppError);
    expect((error as AppError).code).toBe('compute_busy');
    expect(error.message).toMatch(/server is busy/);
    stop.abort();
    await Promise.all(held);
    expect(pool.stats().active).toBe(0);
  });

  it('stops a job that runs past the time limit', async () => {
    pool = createComputePool({ threads: 1, timeoutMs: 50 });
    const error = await refusal(pool.snapshot(1, job(HEAVY)));
    expect((error as AppError).code).toBe('compute_timeout');
    expect(error.message).toMatch(/did not finish within/);
    expect(pool.stats()).toMatchObject({ active: 0, timedOut: 1 });
  });

  it('stops a job whose client went away', async () => {
    pool = createComputePool({ threads: 1 });
    const gone = new AbortController();
    const running = refusal(pool.snapshot(1, job(HEAVY), gone.signal));
    gone.abort();
    expect(((await running) as AppError).code).toBe('compute_cancelled');
    expect(pool.stats()).toMatchObject({ active: 0, cancelled: 1 });
  });
});
