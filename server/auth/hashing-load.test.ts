import { randomBytes } from 'node:crypto';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { afterEach, describe, expect, it } from 'vitest';
import { agentFor, buildTestApp, demo, signIn, type TestApp } from '../test-support/test-app';

let t: TestApp | undefined;
afterEach(async () => {
  await t?.close();
  t = undefined;
});

const percentile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];

describe('password hashing under load', () => {
  it("keeps another user's GET fast while 16 sign-ins with random e-mails hash", async () => {
    t = await buildTestApp();
    const app = t.app;
    const reader = await signIn(app, demo('auditor'));
    const visitors = await Promise.all(Array.from({ length: 16 }, () => agentFor(app)));

    const loop = monitorEventLoopDelay({ resolution: 5 });
    loop.enable();
    let running = true;
    const latencies: number[] = [];
    const sampler = (async () => {
      while (running) {
        const started = performance.now();
        await reader.get('/api/auth/me').expect(200);
        latencies.push(performance.now() - started);
        await new Promise((resolve) => setTimeout(resolve, 5));
      }
    })();
    const started = performance.now();
    const answers = await Promise.all(
      visitors.map((visitor) => visitor.post('/api/auth/login', { email: `${randomBytes(6).toString('hex')}@wellmere-water.example`, password: 'a-guess-1234' })),
    );
    const signInsMs = performance.now() - started;
    running = false;
    await sampler;
    loop.disable();
    const loopP99 = loop.percentile(99) / 1e6;
    const loopMax = loop.max / 1e6;

    expect(answers.map((res) => res.status)).toEqual(Array(16).fill(401));
    latencies.sort((a, b) => a - b);
    const p50 = percentile(latencies, 0.5);
    const p99 = percentile(latencies, 0.99);
    console.log(`16 concurrent sign-ins took ${signInsMs.toFixed(0)} ms; GET /api/auth/me meanwhile: n=${latencies.length}, p50 ${p50.toFixed(1)} ms, p99 ${p99.toFixed(1)} ms, max ${latencies.at(-1)?.toFixed(1)} ms; event-loop delay p99 ${loopP99.toFixed(1)} ms, max ${loopMax.toFixed(1)} ms`);
    // Hashing on the main thread (bcryptjs) served this GET 2 or 3 times in all, each after 1–4 s.
    // The tail here also holds GC pauses and fsync'd writes on a shared 2-core machine, so the
    // median is what the test holds; p99 is printed for the report.
    expect(latencies.length).toBeGreaterThan(5);
    expect(p50).toBeLessThan(100);
  });
});
