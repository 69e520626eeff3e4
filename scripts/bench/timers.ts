/**
 * Timer accuracy: 2,000 timers due within one minute, in 20 days watched by 2 devices each. Lateness is the time
 * from a timer's stored deadline to the moment its alarm reaches a device (one machine, one clock).
 */
import { randomUUID } from 'node:crypto';
import type { SessionView } from '@jarday/contracts';
import { io, type Socket } from 'socket.io-client';
import { api, fmt, percentile, sleep, startJarday } from './support.js';

const DAYS = 20;
const PER_DAY = 100;
const SPREAD_MS = 60_000;
const LEAD_IN_MS = 15_000;

export async function benchTimers(): Promise<Record<string, string>> {
  const server = await startJarday();
  const base = server.url;
  const lead = await api<SessionView>(base, '/api/auth/register', null, {
    email: 'timers@kitchen.test',
    name: 'Timer bench',
    password: 'bench password 123',
  });
  const token = lead.accessToken;
  const kitchen = await api<{ id: string }>(base, '/api/kitchens', token, { name: 'Timer kitchen' });
  const days = await Promise.all(
    Array.from({ length: DAYS }, (_, d) =>
      api<{ id: string }>(base, `/api/kitchens/${kitchen.id}/days`, token, { date: '2026-08-02', title: `Day ${d}` }),
    ),
  );

  const deadlines = new Map<string, number>();
  const lateness: number[] = [];
  const sockets: Socket[] = [];
  for (const [d, day] of days.entries()) {
    for (let i = 0; i < 2; i++) {
      const s = io(base, {
        path: '/socket.io',
        transports: ['websocket'],
        forceNew: true,
        reconnection: false,
        auth: { token, deviceId: `timer-${d}-${i}` },
      });
      await new Promise<void>((r) => s.once('connect', () => r()));
      await s.emitWithAck('day:join', { dayId: day.id });
      s.on('day:event', (e: { type: string; payload: { timerId: string } }) => {
        if (e.type !== 'alarm.raised') return;
        const due = deadlines.get(e.payload.timerId);
        if (due !== undefined) lateness.push(Date.now() - due);
      });
      sockets.push(s);
    }
  }
  // Deadlines spread evenly over one minute, starting after every timer has been created.
  const firstDue = Date.now() + LEAD_IN_MS;
  const total = DAYS * PER_DAY;
  for (let n = 0; n < total; n++) {
    const d = n % DAYS;
    const due = firstDue + Math.floor((n * SPREAD_MS) / total);
    const answer = (await sockets[d * 2]!.emitWithAck('timer:start', {
      commandId: randomUUID(),
      dayId: days[d]!.id,
      timer: { kind: 'custom', label: `t${n}`, durationMs: Math.max(1000, due - Date.now()), startNow: true },
    })) as { data?: { timer: { id: string; deadlineAt: number } }; error?: unknown };
    if (!answer.data) throw new Error(JSON.stringify(answer.error));
    deadlines.set(answer.data.timer.id, answer.data.timer.deadlineAt);
  }
  const setupLeft = firstDue - Date.now();
  await sleep(Math.max(0, firstDue + SPREAD_MS - Date.now()) + 3000);
  for (const s of sockets) s.disconnect();
  await server.stop();
  return {
    'timers created before the first came due': setupLeft > 0 ? 'yes' : `no (${-setupLeft} ms late)`,
    'timer alarms received (2 devices each)': `${lateness.length} of ${total * 2}`,
    'timer lateness at the devices p50': fmt(percentile(lateness, 50)),
    'timer lateness at the devices p99 (goal < 20 ms)': fmt(percentile(lateness, 99)),
    'timer lateness max': fmt(Math.max(...lateness)),
  };
}
