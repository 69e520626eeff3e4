import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { DayJoined, DayView, JournalEvent, LoadView, SessionView, TimerAnswer } from '@jarday/contracts';
import type { Timer } from '@jarday/live';
import { afterAll, describe, expect, it } from 'vitest';
import { command, connectLive, ok, waitForEvent } from './support/live-client.js';
import { freePort, startServerProcess, type ServerProcess } from './support/server-process.js';

/** JSON over fetch against the server process. */
async function api<T>(base: string, path: string, token: string | null, body?: unknown): Promise<T> {
  const res = await fetch(base + path, {
    method: body === undefined ? 'GET' : 'POST',
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${path}: ${res.status} ${await res.text()}`);
  return (await res.json()) as T;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('a server killed with SIGKILL mid-process, then started again', { timeout: 60_000 }, () => {
  const dir = mkdtempSync(join(tmpdir(), 'jarday-restart-'));
  let server: ServerProcess | undefined;
  afterAll(async () => {
    await server?.stop('SIGKILL');
    rmSync(dir, { recursive: true, force: true });
  });

  it('keeps the deadline, fires on time, and fires what came due while it was down at once, marked late', async () => {
    const env = { DATABASE_PATH: join(dir, 'jarday.sqlite'), PORT: String(await freePort()) };
    server = await startServerProcess(env);
    const base = server.url;

    const lead = await api<SessionView>(base, '/api/auth/register', null, {
      email: 'restart@kitchen.test',
      name: 'Ines Restart',
      password: 'a long enough password',
    });
    const token = lead.accessToken;
    const kitchen = await api<{ id: string }>(base, '/api/kitchens', token, { name: 'Restart kitchen' });
    const k = kitchen.id;
    const canner = await api<{ id: string }>(base, `/api/kitchens/${k}/canners`, token, {
      name: 'Bath',
      method: 'boiling-water',
      capacity: { 'half-pint': 12 },
    });
    const recipe = await api<{ id: string }>(base, `/api/kitchens/${k}/recipes/copy`, token, {
      recipeId: 'starter-hot-packed-jam',
    });
    const day = await api<DayView>(base, `/api/kitchens/${k}/days`, token, { date: '2026-09-01' });
    const batch = await api<{ id: string }>(base, `/api/kitchens/${k}/days/${day.id}/batches`, token, {
      recipeId: recipe.id,
      jarSize: 'half-pint',
      pack: 'hot',
      jars: 8,
    });
    const load = await api<LoadView>(base, `/api/kitchens/${k}/days/${day.id}/loads`, token, {
      batchId: batch.id,
      cannerId: canner.id,
      jars: 8,
    });

    let tablet = await connectLive(base, token);
    const joined = await ok<DayJoined>(tablet, 'day:join', { dayId: day.id });
    const processTimer = joined.snapshot.timers.find((x) => x.loadId === load.id)!;
    // A lead shortens the process for the test, with a logged reason (an override the journal keeps).
    await ok(tablet, 'timer:command', command(day.id, processTimer.id, { type: 'water-heating' }));
    await ok(
      tablet,
      'timer:command',
      command(day.id, processTimer.id, {
        type: 'set-duration',
        durationMs: 10_000,
        override: { reason: 'Restart test: a short process' },
      }),
    );
    const running = await ok<TimerAnswer>(
      tablet,
      'timer:command',
      command(day.id, processTimer.id, { type: 'rolling-boil' }),
    );
    const simmer = await ok<TimerAnswer>(tablet, 'timer:start', {
      commandId: crypto.randomUUID(),
      dayId: day.id,
      timer: { kind: 'simmer', label: 'Short simmer', durationMs: 1500, startNow: true },
    });
    const lastSeen = (await ok<DayJoined>(tablet, 'day:join', { dayId: day.id })).snapshot.seq;
    tablet.disconnect();

    await server.stop('SIGKILL');
    await sleep(2500); // the simmer comes due while the server is down; the process does not
    server = await startServerProcess(env);

    tablet = await connectLive(server.url, token);
    const rejoined = await ok<DayJoined>(tablet, 'day:join', { dayId: day.id, sinceSeq: lastSeen });
    const stillRunning = rejoined.snapshot.timers.find((x) => x.id === processTimer.id)!;
    expect(stillRunning.state).toBe('running');
    expect(stillRunning.deadlineAt).toBe(running.timer.deadlineAt);

    const lateDone = rejoined.missed.find(
      (e: JournalEvent) => e.type === 'timer.done' && (e.payload as { timerId: string }).timerId === simmer.timer.id,
    );
    expect(lateDone, 'the simmer fired at start-up').toBeDefined();
    const lateBy = (lateDone!.payload as { detail: { lateByMs: number } }).detail.lateByMs;
    expect(lateBy).toBeGreaterThanOrEqual(1000); // it was due during the ~2.5 s outage
    expect(lateDone!.actor).toBeNull();

    const onTime = await waitForEvent(
      tablet,
      (e) => e.type === 'timer.done' && (e.payload as { timerId: string }).timerId === processTimer.id,
      15_000,
    );
    const detail = (onTime.payload as { detail: { dueAt: number; lateByMs: number }; timer: Timer }).detail;
    expect(detail.dueAt).toBe(running.timer.deadlineAt);
    // Fired by the re-armed timeout at its deadline, not at start-up: far less late than the outage.
    expect(detail.lateByMs).toBeLessThan(1000);
    await waitForEvent(
      tablet,
      (e) => e.type === 'alarm.raised' && (e.payload as { timerId: string }).timerId === processTimer.id,
    );
    tablet.disconnect();
  });
});
