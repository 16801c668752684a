import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { join } from 'node:path';

const root = join(import.meta.dirname, '..', '..');

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

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
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the server exited: ${output}`);
    try {
      if ((await fetch(`${url}/api/health`)).ok) break;
    } catch {
      /* not listening yet */
    }
    if (Date.now() > deadline) throw new Error(`the server did not start: ${output}`);
    await new Promise((r) => setTimeout(r, 100));
  }
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
