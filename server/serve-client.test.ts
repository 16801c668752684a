import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from './app';
import { openDatabase, type Db } from './db/connection';
import { testClock } from './test-support/test-app';

let db: Db;
let app: ReturnType<typeof createApp>;

beforeAll(async () => {
  const dir = mkdtempSync(join(tmpdir(), 'dilutrace-client-'));
  mkdirSync(join(dir, 'client', 'assets'), { recursive: true });
  writeFileSync(join(dir, 'client', 'index.html'), '<!doctype html><title>Dilutrace</title><div id="root"></div>');
  writeFileSync(join(dir, 'client', 'assets', 'app.js'), 'console.log(1)');
  db = await openDatabase(join(dir, 'db.sqlite'));
  app = createApp({
    db,
    mailer: { send: async () => undefined, close: () => undefined },
    clock: testClock(),
    config: {
      sessionSecret: 's'.repeat(40),
      publicUrl: 'http://x',
      production: true,
      trustProxy: false,
      certificateDir: dir,
      clientDir: join(dir, 'client'),
      log: () => undefined,
    },
  });
});
afterAll(async () => {
  await app.close();
  await db.destroy();
});

describe('serving the built client', () => {
  it('answers the root and every client route with the app, assets as files, and unknown API routes as JSON', async () => {
    for (const path of ['/', '/sign-in', '/library/12', '/preparations/3/bench-sheet']) {
      const res = await request(app.app).get(path).expect(200);
      expect(res.text, path).toContain('<div id="root">');
    }
    expect((await request(app.app).get('/assets/app.js').expect(200)).text).toBe('console.log(1)');
    const missing = await request(app.app).get('/assets/missing.js').expect(404);
    expect(missing.body.error.code).toBe('not_found');
    const api = await request(app.app).get('/api/missing').expect(404);
    expect(api.body.error.code).toBe('not_found');
  });
});
