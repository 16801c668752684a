import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort, waitForHealth } from '../../support/server-process-helpers';

export type RunningServer = { baseUrl: string; output: () => string; stop: () => Promise<void> };

/**
 * Starts `server/index.ts` in production mode on a free port, against a fresh SQLite
 * file seeded with the demo lab, serving the client that `vite build` left in dist/client.
 */
export async function startDilutraceServer(demoPassword: string): Promise<RunningServer> {
  if (!existsSync('dist/client/index.html'))
    throw new Error('dist/client is missing: run `vite build` before the browser tests.');
  const dataDir = mkdtempSync(join(tmpdir(), 'dilutrace-e2e-'));
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const child = spawn('npx', ['tsx', 'server/index.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(port),
      DILUTRACE_DB: join(dataDir, 'db.sqlite'),
      DILUTRACE_SEED_DEMO: '1',
      DILUTRACE_DEMO_PASSWORD: demoPassword,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true,
  });
  let log = '';
  child.stdout?.on('data', (chunk) => (log += chunk));
  child.stderr?.on('data', (chunk) => (log += chunk));
  const output = () => log;

  const stop = async () => {
    if (child.exitCode === null && child.pid) {
      const exited = new Promise((resolve) => child.once('exit', resolve));
      process.kill(-child.pid, 'SIGTERM');
      const forced = setTimeout(() => child.pid && process.kill(-child.pid, 'SIGKILL'), 5000);
      await exited;
      clearTimeout(forced);
    }
    rmSync(dataDir, { recursive: true, force: true });
  };

  try {
    await waitForHealth(baseUrl, child, output, 45_000);
  } catch (error) {
    await stop();
    throw error;
  }
  return { baseUrl, output, stop };
}
