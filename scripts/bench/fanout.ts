/**
 * Fan-out: 1,000 socket.io devices in 250 days (4 each). In each round every day sends one command within a
 * 100 ms window; each device notes when the broadcast reaches it. The same pattern runs against a bare socket.io
 * server (no framework, no database) for the ratio. Also: the Jarday server's memory with 1,000 devices connected.
 */
import { randomUUID } from 'node:crypto';
import { join } from 'node:path';
import type { SessionView } from '@jarday/contracts';
import { io, type Socket } from 'socket.io-client';
import { api, fmt, percentile, ROOT, rssMb, sleep, startJarday, startProcess } from './support.js';

const DAYS = Number(process.env.BENCH_DAYS ?? 250);
const PER_DAY = 4;
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 5);
const WINDOW_MS = 100;

function connect(url: string, auth?: object): Promise<Socket> {
  const socket = io(url, { path: '/socket.io', transports: ['websocket'], reconnection: false, forceNew: true, auth });
  return new Promise((resolve, reject) => {
    socket.once('connect', () => resolve(socket));
    socket.once('connect_error', reject);
  });
}

async function inBatches<T>(n: number, size: number, make: (i: number) => Promise<T>): Promise<T[]> {
  const out: T[] = [];
  for (let i = 0; i < n; i += size)
    out.push(...(await Promise.all(Array.from({ length: Math.min(size, n - i) }, (_, j) => make(i + j)))));
  return out;
}

interface Rig {
  devices: Socket[][];
  send: (day: number, tag: string) => void;
  onReceive: (socket: Socket, handler: (tag: string) => void) => void;
}

async function measure(rig: Rig): Promise<number[]> {
  const latencies: number[] = [];
  const sentAt = new Map<string, number>();
  for (const room of rig.devices)
    for (const s of room)
      rig.onReceive(s, (tag) => {
        const t0 = sentAt.get(tag);
        if (t0 !== undefined) latencies.push(performance.now() - t0);
      });
  for (let round = 0; round < ROUNDS; round++) {
    const start = performance.now();
    for (let d = 0; d < DAYS; d++) {
      const due = start + (d * WINDOW_MS) / DAYS;
      while (performance.now() < due) await new Promise((r) => setImmediate(r));
      const tag = `r${round}-d${d}`;
      sentAt.set(tag, performance.now());
      rig.send(d, tag);
    }
    await sleep(Number(process.env.BENCH_ROUND_GAP_MS ?? 1500));
  }
  return latencies;
}

export async function benchFanout(): Promise<Record<string, string>> {
  // ---- Jarday ----
  const server = await startJarday();
  const base = server.url;
  const members = await inBatches(PER_DAY, PER_DAY, (i) =>
    api<SessionView>(base, '/api/auth/register', null, {
      email: `bench${i}@kitchen.test`,
      name: `Bench ${i}`,
      password: 'bench password 123',
    }),
  );
  const lead = members[0]!.accessToken;
  const kitchen = await api<{ id: string }>(base, '/api/kitchens', lead, { name: 'Bench kitchen' });
  for (const m of members.slice(1)) {
    const invite = await api<{ code: string }>(base, `/api/kitchens/${kitchen.id}/invites`, lead, { role: 'helper' });
    await api(base, `/api/invites/${invite.code}/redeem`, m.accessToken, {});
  }
  const days = await inBatches(DAYS, 25, (d) =>
    api<{ id: string }>(base, `/api/kitchens/${kitchen.id}/days`, lead, { date: '2026-08-01', title: `Day ${d}` }),
  );
  const devices = await inBatches(DAYS, 25, async (d) =>
    Promise.all(
      members.map(async (m, i) => {
        const s = await connect(base, { token: m.accessToken, deviceId: `bench-${d}-${i}` });
        const joined = (await s.emitWithAck('day:join', { dayId: days[d]!.id })) as { error?: unknown };
        if (joined.error) throw new Error(JSON.stringify(joined.error));
        return s;
      }),
    ),
  );
  await sleep(500);
  const rss = rssMb(server.child.pid!);
  const jarday = await measure({
    devices,
    send: (d, tag) =>
      devices[d]![0]!.emit(
        'timer:start',
        { commandId: randomUUID(), dayId: days[d]!.id, timer: { kind: 'custom', label: tag, durationMs: 600_000 } },
        () => undefined,
      ),
    onReceive: (s, handler) =>
      s.on('day:event', (e: { type: string; payload: { timer?: { label: string } } }) => {
        if (e.type === 'timer.created' && e.payload.timer) handler(e.payload.timer.label);
      }),
  });
  for (const room of devices) for (const s of room) s.disconnect();
  await server.stop();

  // ---- bare socket.io ----
  const bare = await startProcess(
    [join(ROOT, 'scripts/bench/bare-server.mjs')],
    {},
    async (url) => (await fetch(`${url}/health`)).ok,
  );
  const bareDevices = await inBatches(DAYS, 25, async (d) =>
    Promise.all(
      Array.from({ length: PER_DAY }, async () => {
        const s = await connect(bare.url);
        await s.emitWithAck('join', `room-${d}`);
        return s;
      }),
    ),
  );
  await sleep(500);
  const baseline = await measure({
    devices: bareDevices,
    send: (d, tag) => bareDevices[d]![0]!.emit('cmd', { room: `room-${d}`, tag }, () => undefined),
    onReceive: (s, handler) => s.on('event', (e: { tag: string }) => handler(e.tag)),
  });
  for (const room of bareDevices) for (const s of room) s.disconnect();
  await bare.stop();

  const expected = DAYS * PER_DAY * ROUNDS;
  const p50 = percentile(jarday, 50);
  const p99 = percentile(jarday, 99);
  const b50 = percentile(baseline, 50);
  const b99 = percentile(baseline, 99);
  return {
    'fan-out deliveries (Jarday)': `${jarday.length} of ${expected}`,
    'fan-out p50 (Jarday)': fmt(p50),
    'fan-out p99 (Jarday, goal < 50 ms)': fmt(p99),
    'fan-out deliveries (bare socket.io)': `${baseline.length} of ${expected}`,
    'fan-out p50 (bare socket.io)': fmt(b50),
    'fan-out p99 (bare socket.io)': fmt(b99),
    'fan-out p99 ratio Jarday / bare (goal < 2x)': `${(p99 / b99).toFixed(2)}x`,
    'fan-out p50 ratio Jarday / bare': `${(p50 / b50).toFixed(2)}x`,
    'server RSS with 1,000 devices connected (goal < 250 MB)': `${rss.toFixed(1)} MB`,
  };
}
