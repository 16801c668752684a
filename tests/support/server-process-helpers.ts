import type { ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';

/** A port nobody listens on right now, chosen by the operating system. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

/** Waits until a server process answers GET /api/health; fails early if the process exits. */
export async function waitForHealth(
  baseUrl: string,
  child: ChildProcess,
  output: () => string,
  timeoutMs: number,
): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The server exited with code ${child.exitCode}:\n${output()}`);
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok && ((await response.json()) as { status?: string }).status === 'ok') return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`The server did not answer /api/health within ${timeoutMs} ms:\n${output()}`);
}
