import { rmSync, writeFileSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { createApp } from './app';
import { createComputePool } from './compute/compute-pool';
import { certificateDir, databaseTarget, loadEnv } from './config/env';
import { pidFileOf } from './db/backup';
import { openDatabase } from './db/connection';
import { seedDemoLab } from './db/seed-demo';
import { sessionSecret } from './db/settings-repository';
import { systemClock } from './lib/clock';
import { startCaptureServer } from './mail/capture-server';
import { createSmtpMailer } from './mail/mailer';
import { usersRepository } from './auth/users-repository';

const env = loadEnv();
const db = await openDatabase(databaseTarget(env));
if (env.DILUTRACE_SEED_DEMO === '1' && (await usersRepository(db).count()) === 0) {
  await seedDemoLab(db, {
    password: env.DILUTRACE_DEMO_PASSWORD,
    now: systemClock.now(),
    certificateDir: certificateDir(env),
  });
  console.log('Seeded the demo lab (Wellmere Regional Water Laboratory).');
}

const capture = env.SMTP_URL ? null : await startCaptureServer(db, () => systemClock.now());
const mailer = createSmtpMailer(env.SMTP_URL ?? `smtp://127.0.0.1:${capture?.port}`, env.MAIL_FROM);
const production = env.NODE_ENV === 'production';
const publicUrl = env.DILUTRACE_PUBLIC_URL ?? `http://${env.HOST === '0.0.0.0' ? '127.0.0.1' : env.HOST}:${env.PORT}`;

const {
  app,
  sessions,
  close: closeApp,
} = createApp({
  db,
  mailer,
  clock: systemClock,
  computer: createComputePool({
    ...(env.DILUTRACE_COMPUTE_THREADS ? { threads: env.DILUTRACE_COMPUTE_THREADS } : {}),
    ...(env.DILUTRACE_COMPUTE_JOBS_PER_LAB ? { jobsPerLab: env.DILUTRACE_COMPUTE_JOBS_PER_LAB } : {}),
  }),
  config: {
    sessionSecret: env.DILUTRACE_SESSION_SECRET ?? (await sessionSecret(db)),
    publicUrl,
    production,
    trustProxy: env.DILUTRACE_TRUST_PROXY === '1',
    signInLimit: env.DILUTRACE_SIGNIN_LIMIT,
    attemptLimits: { perClient: env.DILUTRACE_SIGNIN_CLIENT_LIMIT, perInstance: env.DILUTRACE_SIGNIN_INSTANCE_LIMIT },
    certificateDir: certificateDir(env),
    clientDir: production ? 'dist/client' : undefined,
  },
});
await sessions.prune();

// Names this process in `npm run restore`'s refusal (the database's own lock is what refuses).
const pidFile = env.DATABASE_URL ? null : pidFileOf(env.DILUTRACE_DB);
if (pidFile) writeFileSync(pidFile, String(process.pid));

const server = app.listen(env.PORT, env.HOST, () => {
  const { port } = server.address() as AddressInfo;
  const url = env.DILUTRACE_PUBLIC_URL ?? `http://${env.HOST === '0.0.0.0' ? '127.0.0.1' : env.HOST}:${port}`;
  console.log(`Dilutrace is running at ${url}${production ? '' : ' (API only; the client runs under Vite on :5173)'}`);
  if (!env.SMTP_URL)
    console.log(
      `Mail is captured locally (SMTP on 127.0.0.1:${capture?.port}); the instance operator reads it under Captured mail.`,
    );
});

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  console.log(`${signal} received, shutting down.`);
  server.close();
  server.closeAllConnections();
  mailer.close();
  await closeApp();
  await capture?.close();
  await db.destroy();
  if (pidFile) rmSync(pidFile, { force: true });
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
