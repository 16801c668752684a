import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { freePort, waitForHealth } from '../support/server-process-helpers';

const root = join(import.meta.dirname, '..', '..');

export interface RunningServer {
  url: string;
  process: ChildProcess;
  output: () => string;
}

/** Starts `server/index.ts` as its own process (the way `npm start` runs it) and waits for /api/health. */
export async function startServer(env: Record<string, string>): Promise<RunningServer> {
  const port = await freePort();
  let output = '';
  const child = spawn(process.execPath, ['--import', 'tsx', join(root, 'server', 'index.ts')], {
    cwd: root,
    env: { ...process.env, NODE_ENV: 'test', PORT: String(port), HOST: '127.0.0.1', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (chunk) => (output += String(chunk)));
  child.stderr?.on('data', (chunk) => (output += String(chunk)));
  const url = `http://127.0.0.1:${port}`;
  await waitForHealth(url, child, () => output, 30_000);
  return { url, process: child, output: () => output };
}

/** A minimal cookie-and-CSRF client over fetch, for tests against a real server process. */
export async function httpClient(url: string) {
  let cookie = '';
  let token = '';
  const request = async (method: string, path: string, body?: unknown) => {
    const res = await fetch(`${url}${path}`, {
      method,
      headers: { cookie, 'content-type': 'application/json', ...(method === 'GET' ? {} : { 'x-csrf-token': token }) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const set = res.headers.get('set-cookie');
    if (set) cookie = set.split(';')[0];
    const text = await res.text();
    const json = text && res.headers.get('content-type')?.includes('json') ? JSON.parse(text) : text;
    return { status: res.status, body: json };
  };
  token = (await request('GET', '/api/auth/csrf')).body.csrfToken;
  return {
    request,
    cookie: () => cookie,
    async signIn(email: string, password: string) {
      const res = await request('POST', '/api/auth/login', { email, password });
      if (res.status !== 200) throw new Error(`sign-in failed: ${res.status}`);
      token = res.body.csrfToken;
      return res.body as { activeLabId: number };
    },
  };
}
