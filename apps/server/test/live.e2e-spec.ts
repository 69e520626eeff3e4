import { randomUUID } from 'node:crypto';
import type { DayJoined, JournalEvent, TimerAnswer } from '@jarday/contracts';
import type { Timer } from '@jarday/live';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { dayWithLoad } from './support/day-fixture.js';
import { call, command, connectLive, type LiveClient, ok, waitForEvent } from './support/live-client.js';
import { kitchenWithCrew, startTestApp, type TestApp } from './support/test-app.js';

type Crew = Awaited<ReturnType<typeof kitchenWithCrew>>;

describe('the live day over socket.io (e2e: real server on a port, real clients, real SQLite file)', () => {
  let t: TestApp;
  let crew: Crew;
  const clients: LiveClient[] = [];
  const connect = async (token: string) => {
    const c = await connectLive(t.url, token);
    clients.push(c);
    return c;
  };

  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000' }, true);
    crew = await kitchenWithCrew(t.http); // at 2,100 ft
  });
  afterEach(() => {
    for (const c of clients.splice(0)) c.disconnect();
  });
  afterAll(() => t.close());

  async function joinedPair() {
    const { day, load } = await dayWithLoad(t.http, crew.kitchen.id, crew.lead);
    const tablet = await connect(crew.lead.token);
    const phone = await connect(crew.helper.token);
    const joined = await ok<DayJoined>(tablet, 'day:join', { dayId: day.id });
    await ok<DayJoined>(phone, 'day:join', { dayId: day.id });
    const timer = joined.snapshot.timers.find((x) => x.loadId === load.id)!;
    return { day, load, tablet, phone, timer, joined };
  }

  it('a load comes with its process timer, timed from the plan: hot-packed jam at 2,100 ft is 10 min (USDA Guide 7)', async () => {
    const { timer, load } = await joinedPair();
    expect(load.plan.minutes).toBe(10);
    expect(timer).toMatchObject({ kind: 'process', state: 'armed', durationMs: 600_000, minimumMs: 600_000 });
  });

  it("the phone's rolling boil is acknowledged to the phone and broadcast to the tablet", async () => {
    const { day, tablet, phone, timer } = await joinedPair();
    await ok<TimerAnswer>(phone, 'timer:command', command(day.id, timer.id, { type: 'water-heating' }));
    const boil = await ok<TimerAnswer>(phone, 'timer:command', command(day.id, timer.id, { type: 'rolling-boil' }));
    expect(boil.timer.state).toBe('running');
    expect(boil.timer.deadlineAt! - boil.timer.phaseStartedAt!).toBe(600_000);
    const seen = await waitForEvent(tablet, (e) => e.type === 'timer.boil-confirmed');
    expect(seen.actor).toEqual({ userId: crew.helper.user.id, name: 'Helper' });
    expect((seen.payload as { timer: Timer }).timer.deadlineAt).toBe(boil.timer.deadlineAt);
    // The sender gets the broadcast too, with the same number.
    const mine = await waitForEvent(phone, (e) => e.type === 'timer.boil-confirmed');
    expect(mine.seq).toBe(seen.seq);
  });

  it('boil lost sends the load back to waiting with the full time (USDA Guide 1, 2015; from memory)', async () => {
    const { day, tablet, phone, timer } = await joinedPair();
    await ok(phone, 'timer:command', command(day.id, timer.id, { type: 'water-heating' }));
    await ok(phone, 'timer:command', command(day.id, timer.id, { type: 'rolling-boil' }));
    const lost = await ok<TimerAnswer>(tablet, 'timer:command', command(day.id, timer.id, { type: 'boil-lost' }));
    expect(lost.timer).toMatchObject({ state: 'waiting-for-boil', deadlineAt: null, restarts: 1 });
    await waitForEvent(phone, (e) => e.type === 'timer.boil-lost');
    const again = await ok<TimerAnswer>(phone, 'timer:command', command(day.id, timer.id, { type: 'rolling-boil' }));
    expect(again.timer.deadlineAt! - again.timer.phaseStartedAt!).toBe(600_000);
  });

  it('a watcher follows the day but cannot command; an outsider cannot even join', async () => {
    const { day, timer } = await joinedPair();
    const watcher = await connect(crew.watcher.token);
    await ok<DayJoined>(watcher, 'day:join', { dayId: day.id });
    const refused = await call(watcher, 'timer:command', command(day.id, timer.id, { type: 'water-heating' }));
    expect(refused).toMatchObject({ error: { code: 'forbidden' } });

    const outsider = await connect(crew.outsider.token);
    expect(await call(outsider, 'day:join', { dayId: day.id })).toMatchObject({ error: { code: 'not_found' } });
    // Not joined, so not even a command by a known id works.
    expect(await call(outsider, 'timer:command', command(day.id, timer.id, { type: 'water-heating' }))).toMatchObject({
      error: { code: 'not_joined' },
    });
  });

  it('refuses a handshake without a valid token', async () => {
    await expect(connectLive(t.url, 'not-a-token')).rejects.toThrow(/sign in/i);
    await expect(connectLive(t.url, crew.lead.token, 'x')).rejects.toThrow(/device id/i);
  });

  it('a retried command acts once and gets the first answer again; a reused id for another command is refused', async () => {
    const { day, phone, timer } = await joinedPair();
    const id = randomUUID();
    const first = await call<TimerAnswer>(
      phone,
      'timer:command',
      command(day.id, timer.id, { type: 'water-heating' }, id),
    );
    const retry = await call<TimerAnswer>(
      phone,
      'timer:command',
      command(day.id, timer.id, { type: 'water-heating' }, id),
    );
    expect(retry).toEqual(first);
    const reused = await call(phone, 'timer:command', command(day.id, timer.id, { type: 'cancel' }, id));
    expect(reused).toMatchObject({ error: { code: 'command_id_reused' } });
    const heating = (await request(t.http).get(`/api/kitchens/${crew.kitchen.id}/days/${day.id}`).set(crew.lead.auth))
      .body as {
      seq: number;
    };
    const joined = await ok<DayJoined>(phone, 'day:join', { dayId: day.id, sinceSeq: 0 });
    expect(joined.missed.filter((e) => e.type === 'timer.heating')).toHaveLength(1);
    expect(joined.snapshot.seq).toBe(heating.seq);
  });

  it('two helpers pressing "rolling boil" in the same instant start one timer', async () => {
    const { day, tablet, phone, timer } = await joinedPair();
    await ok(phone, 'timer:command', command(day.id, timer.id, { type: 'water-heating' }));
    const [a, b] = await Promise.all([
      call<TimerAnswer>(tablet, 'timer:command', command(day.id, timer.id, { type: 'rolling-boil' })),
      call<TimerAnswer>(phone, 'timer:command', command(day.id, timer.id, { type: 'rolling-boil' })),
    ]);
    if ('error' in a || 'error' in b) throw new Error('a rolling boil was refused');
    expect([a.data.noop, b.data.noop].sort()).toEqual([false, true]);
    expect(a.data.timer.deadlineAt).toBe(b.data.timer.deadlineAt);
    await new Promise((r) => setTimeout(r, 200));
    expect(tablet.received.filter((e) => e.type === 'timer.boil-confirmed')).toHaveLength(1);
  });

  it('a device that missed events gets exactly those, in order, when it joins again', async () => {
    const { day, tablet, phone, timer, joined } = await joinedPair();
    phone.disconnect();
    // The tablet runs a simmer timer through a few changes while the phone is away.
    const simmer = await ok<TimerAnswer>(tablet, 'timer:start', {
      commandId: randomUUID(),
      dayId: day.id,
      timer: { kind: 'simmer', label: 'Jam at a simmer', durationMs: 300_000 },
    });
    for (const type of ['start', 'pause', 'resume']) {
      await ok(tablet, 'timer:command', command(day.id, simmer.timer.id, { type }));
    }
    await ok(tablet, 'timer:command', command(day.id, timer.id, { type: 'water-heating' }));
    const back = await connect(crew.helper.token);
    const rejoined = await ok<DayJoined>(back, 'day:join', { dayId: day.id, sinceSeq: joined.snapshot.seq });
    const seqs = rejoined.missed.map((e: JournalEvent) => e.seq);
    expect(seqs).toEqual(Array.from({ length: seqs.length }, (_, i) => joined.snapshot.seq + 1 + i));
    expect(rejoined.missed.map((e) => e.type)).toEqual([
      'timer.created',
      'timer.started',
      'timer.paused',
      'timer.resumed',
      'timer.heating',
    ]);
    expect(rejoined.snapshot.seq).toBe(seqs.at(-1));
  });

  it('a timer comes due on the server, its alarm reaches every device, and an acknowledgement silences all', async () => {
    const { day, tablet, phone } = await joinedPair();
    const dip = await ok<TimerAnswer>(tablet, 'timer:start', {
      commandId: randomUUID(),
      dayId: day.id,
      timer: { kind: 'blanch', label: 'Tomato dip', durationMs: 1000, startNow: true },
    });
    const raised = await waitForEvent(
      phone,
      (e) => e.type === 'alarm.raised' && (e.payload as { timerId: string }).timerId === dip.timer.id,
    );
    expect(raised.actor).toBeNull();
    await waitForEvent(tablet, (e) => e.type === 'alarm.raised');
    const acked = await ok<TimerAnswer>(phone, 'alarm:ack', {
      commandId: randomUUID(),
      dayId: day.id,
      timerId: dip.timer.id,
    });
    expect(acked.timer.alarm?.acknowledgedBy).toBe(crew.helper.user.id);
    const heard = await waitForEvent(tablet, (e) => e.type === 'alarm.acknowledged');
    expect((heard.payload as { timer: Timer }).timer.alarm?.acknowledgedAt).toBeTypeOf('number');
  });

  it('answers clock pings with the RFC 5905 server timestamps', async () => {
    const c = await connect(crew.helper.token);
    const t1 = Date.now();
    const pong = await ok<{ t1: number; t2: number; t3: number }>(c, 'clock:ping', { t1 });
    expect(pong.t1).toBe(t1);
    expect(pong.t3).toBeGreaterThanOrEqual(pong.t2);
  });

  it('renews a connected session with a fresh token of the same person only', async () => {
    const c = await connect(crew.helper.token);
    const renewed = await ok<{ expiresAt: number }>(c, 'session:renew', { token: crew.helper.token });
    expect(renewed.expiresAt).toBeGreaterThan(Date.now());
    expect(await call(c, 'session:renew', { token: crew.lead.token })).toMatchObject({
      error: { code: 'unauthorized' },
    });
  });

  it('a closed day is read-only', async () => {
    const { day, phone, timer } = await joinedPair();
    await request(t.http).post(`/api/kitchens/${crew.kitchen.id}/days/${day.id}/close`).set(crew.lead.auth).expect(200);
    expect(await call(phone, 'timer:command', command(day.id, timer.id, { type: 'water-heating' }))).toMatchObject({
      error: { code: 'invalid_state' },
    });
    await request(t.http)
      .post(`/api/kitchens/${crew.kitchen.id}/days/${day.id}/batches`)
      .set(crew.lead.auth)
      .send({ recipeId: 'x', jarSize: 'pint', pack: 'hot', jars: 1 })
      .expect(409);
  });

  it('an alarm that rings after the day was closed can still be silenced, and nothing else moves', async () => {
    const { day, tablet, phone } = await joinedPair();
    const dip = await ok<TimerAnswer>(tablet, 'timer:start', {
      commandId: randomUUID(),
      dayId: day.id,
      timer: { kind: 'blanch', label: 'Last dip', durationMs: 1000, startNow: true },
    });
    await request(t.http).post(`/api/kitchens/${crew.kitchen.id}/days/${day.id}/close`).set(crew.lead.auth).expect(200);
    await waitForEvent(
      phone,
      (e) => e.type === 'alarm.raised' && (e.payload as { timerId: string }).timerId === dip.timer.id,
    );
    expect(
      await call(phone, 'timer:command', command(day.id, dip.timer.id, { type: 'add-time', addMs: 60_000 })),
    ).toMatchObject({
      error: { code: 'invalid_state' },
    });
    const acked = await ok<TimerAnswer>(phone, 'alarm:ack', {
      commandId: randomUUID(),
      dayId: day.id,
      timerId: dip.timer.id,
    });
    expect(acked.timer.alarm?.acknowledgedBy).toBe(crew.helper.user.id);
  });
});

describe('the step guide over socket.io (e2e)', () => {
  let t: TestApp;
  let crew: Crew;
  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000' }, true);
    crew = await kitchenWithCrew(t.http);
  });
  afterAll(() => t.close());

  it('a tick reaches the other device, lands in the journal and in the next snapshot; watchers cannot tick', async () => {
    const { day, load } = await dayWithLoad(t.http, crew.kitchen.id, crew.lead);
    const tablet = await connectLive(t.url, crew.lead.token);
    const phone = await connectLive(t.url, crew.helper.token);
    const watcher = await connectLive(t.url, crew.watcher.token);
    for (const c of [tablet, phone, watcher]) await ok(c, 'day:join', { dayId: day.id });
    const tick = { commandId: randomUUID(), dayId: day.id, loadId: load.id, step: 'headspace' };
    const answer = await ok<{ mark: { done: boolean; by: { name: string } } }>(phone, 'step:confirm', tick);
    expect(answer.mark).toMatchObject({ done: true, by: { name: 'Helper' } });
    expect(await call(phone, 'step:confirm', tick)).toEqual({ data: answer });
    const seen = await waitForEvent(tablet, (e) => e.type === 'step.confirmed');
    expect(seen.payload).toMatchObject({ mark: { subjectId: load.id, step: 'headspace' } });
    expect(await call(watcher, 'step:confirm', { ...tick, commandId: randomUUID() })).toMatchObject({
      error: { code: 'forbidden' },
    });
    expect(await call(phone, 'step:confirm', { ...tick, commandId: randomUUID(), loadId: randomUUID() })).toMatchObject(
      {
        error: { code: 'not_found' },
      },
    );
    await ok(tablet, 'step:confirm', { ...tick, commandId: randomUUID(), done: false });
    const joined = await ok<DayJoined>(phone, 'day:join', { dayId: day.id });
    expect(joined.snapshot.steps).toEqual([expect.objectContaining({ step: 'headspace', done: false })]);
    for (const c of [tablet, phone, watcher]) c.disconnect();
  });
});

describe('lifting a load (e2e)', () => {
  let t: TestApp;
  let crew: Crew;
  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000' }, true);
    crew = await kitchenWithCrew(t.http);
  });
  afterAll(() => t.close());

  it("starting a load's cooling rest records when its jars were lifted, once", async () => {
    const { day, load } = await dayWithLoad(t.http, crew.kitchen.id, crew.lead);
    const phone = await connectLive(t.url, crew.helper.token);
    await ok(phone, 'day:join', { dayId: day.id });
    const rest = { kind: 'cooling-rest', label: 'Load 1 cooling', loadId: load.id, startNow: true };
    const started = await ok<TimerAnswer>(phone, 'timer:start', {
      commandId: randomUUID(),
      dayId: day.id,
      timer: rest,
    });
    expect(started.timer.durationMs).toBe(12 * 3600_000); // USDA Guide: cool undisturbed 12 to 24 hours
    const lifted = await waitForEvent(phone, (e) => e.type === 'load.lifted');
    const view = (await request(t.http).get(`/api/kitchens/${crew.kitchen.id}/days/${day.id}`).set(crew.lead.auth))
      .body as {
      loads: { id: string; liftedAt: string | null }[];
    };
    expect(view.loads[0]?.liftedAt).toBe(lifted.at);
    expect(await call(phone, 'timer:start', { commandId: randomUUID(), dayId: day.id, timer: rest })).toMatchObject({
      error: { code: 'invalid_state' },
    });
    phone.disconnect();
  });
});
