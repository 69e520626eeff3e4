import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = fileURLToPath(new URL('../../', import.meta.url));
export const SERVER_MAIN = join(ROOT, 'apps/server/dist/main.js');

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const a = srv.address();
      srv.close(() => (typeof a === 'object' && a ? resolve(a.port) : reject(new Error('no port'))));
    });
  });
}

export const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Nearest-rank percentile of a sample. */
export function percentile(values: number[], p: number): number {
  if (values.length === 0) return Number.NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))]!;
}

export const fmt = (ms: number) => `${ms.toFixed(2)} ms`;

/** Resident memory of a process, from /proc (Linux). */
export function rssMb(pid: number): number {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? Number.NaN);
  return kb / 1024;
}

export interface Proc {
  child: ChildProcess;
  url: string;
  stop: () => Promise<void>;
}

/** Starts a Node script as its own process and waits until `ready` answers. */
export async function startProcess(
  args: string[],
  env: Record<string, string>,
  ready: (url: string) => Promise<boolean>,
): Promise<Proc> {
  const port = await freePort();
  // BENCH_NODE_ARGS, e.g. "--cpu-prof --cpu-prof-dir=/tmp/prof", to profile the servers under load.
  const nodeArgs = (process.env.BENCH_NODE_ARGS ?? '').split(' ').filter(Boolean);
  const child = spawn(process.execPath, [...nodeArgs, ...args], {
    env: { PATH: process.env.PATH, HOST: '127.0.0.1', ...env, PORT: String(port) },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const url = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 300; i++) {
    if (child.exitCode !== null) throw new Error(`${args.join(' ')} exited early`);
    try {
      if (await ready(url)) break;
    } catch {
      /* not yet */
    }
    await sleep(100);
  }
  return {
    child,
    url,
    stop: () =>
      new Promise((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}

/** The built Jarday server on a fresh SQLite file, with limits loosened for load. */
export function startJarday(): Promise<Proc> {
  const dir = mkdtempSync(join(tmpdir(), 'jarday-bench-'));
  return startProcess(
    [SERVER_MAIN],
    {
      NODE_ENV: 'production',
      JWT_SECRET: 'bench-secret-bench-secret-bench-secret-0123',
      DATABASE_PATH: join(dir, 'jarday.sqlite'),
      SIGNIN_THROTTLE_LIMIT: '10000',
      ACCESS_TOKEN_TTL_SECONDS: '3600',
    },
    async (url) => (await fetch(`${url}/api/health`)).ok,
  );
}

export async function api<T>(base: string, path: string, token: string | null, body?: unknown): Promise<T> {
  const res = await fetch(base + path, {
    method: body === undefined ? 'GET' : 'POST',
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${path}: ${res.status} ${await res.text()}`);
  return (await res.json()) as T;
}
