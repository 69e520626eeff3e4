import { type ChildProcess, spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';

export const SERVER_MAIN = fileURLToPath(new URL('../../dist/main.js', import.meta.url));

/** Asks the OS for a free loopback port. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const address = srv.address();
      srv.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

export interface ServerProcess {
  child: ChildProcess;
  url: string;
  output: () => string;
  exited: Promise<number | null>;
  stop: (signal?: NodeJS.Signals) => Promise<number | null>;
}

/**
 * Starts the built server (apps/server/dist/main.js) as its own process, the way it ships.
 * The test script builds it first; a missing build is a clear failure, not a skip.
 */
export async function startServerProcess(env: Record<string, string>, waitForHealth = true): Promise<ServerProcess> {
  if (!existsSync(SERVER_MAIN)) throw new Error(`${SERVER_MAIN} is missing: run "npm run build:server" first`);
  const port = env.PORT ?? String(await freePort());
  const child = spawn(process.execPath, [SERVER_MAIN], {
    env: { PATH: process.env.PATH, NODE_ENV: 'test', HOST: '127.0.0.1', ...env, PORT: port },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  child.stdout?.on('data', (d: Buffer) => (out += d.toString()));
  child.stderr?.on('data', (d: Buffer) => (out += d.toString()));
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  const url = `http://127.0.0.1:${port}`;
  const proc: ServerProcess = {
    child,
    url,
    output: () => out,
    exited,
    stop: async (signal = 'SIGTERM') => {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
      return exited;
    },
  };
  if (!waitForHealth) return proc;
  const deadline = Date.now() + 20_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${out}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return proc;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  await proc.stop('SIGKILL');
  throw new Error(`server did not become healthy:\n${out}`);
}
