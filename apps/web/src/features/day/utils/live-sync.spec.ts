import type { DayJoined, JournalEvent } from '@jarday/contracts';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { LiveAuth, LiveSocket } from '../../../lib/socket';
import { useLiveStore } from '../stores/live-store';
import { DAY_ID, journal, move, processTimer, T0 } from '../testing/day-fixtures';
import { startLiveSync } from './live-sync';

type Handler = (...args: unknown[]) => void;

/** A socket.io client stand-in: records what is sent, answers from a table, and fires what the server would. */
class FakeSocket {
  connected = false;
  active = true;
  sent: { event: string; payload: unknown }[] = [];
  answers: Record<string, (payload: never) => unknown> = {};
  private handlers = new Map<string, Set<Handler>>();

  on(event: string, fn: Handler) {
    this.handlers.set(event, (this.handlers.get(event) ?? new Set()).add(fn));
    return this;
  }
  off(event: string, fn: Handler) {
    this.handlers.get(event)?.delete(fn);
    return this;
  }
  fire(event: string, ...args: unknown[]) {
    for (const fn of [...(this.handlers.get(event) ?? [])]) fn(...args);
  }
  connect() {
    this.connected = true;
    this.fire('connect');
  }
  disconnect() {
    if (!this.connected) return;
    this.connected = false;
    this.fire('disconnect', 'io client disconnect');
  }
  /** The link drops under us (Wi-Fi, server restart). */
  drop() {
    this.connected = false;
    this.fire('disconnect', 'transport close');
  }
  timeout() {
    return {
      emitWithAck: (event: string, payload: unknown) => {
        this.sent.push({ event, payload });
        const answer = this.answers[event];
        return answer ? Promise.resolve(answer(payload as never)) : new Promise(() => undefined);
      },
    };
  }
  joins() {
    return this.sent.filter((s) => s.event === 'day:join').map((s) => s.payload);
  }
}

const joined = (seq: number, timers = [processTimer()]): { data: DayJoined } => ({
  data: { snapshot: { dayId: DAY_ID, seq, serverTime: T0, timers, steps: [] }, missed: [], missedComplete: true },
});
const flush = () => vi.advanceTimersByTimeAsync(0);

describe('the live sync', () => {
  let socket: FakeSocket;
  let stop: () => void;
  const onDayChanged = vi.fn();
  const auth: LiveAuth = {
    getToken: () => 'token-1',
    renew: vi.fn(() => Promise.resolve('token-2')),
    onToken: () => () => undefined,
  };
  const start = () => {
    stop = startLiveSync(DAY_ID, { socket: socket as unknown as LiveSocket, auth, onDayChanged });
  };

  beforeEach(() => {
    vi.useFakeTimers({ now: T0 });
    useLiveStore.setState({ dayId: null, seq: 0, timers: {}, connection: 'idle', clockOffsetMs: 0 });
    socket = new FakeSocket();
    onDayChanged.mockReset();
  });
  afterEach(() => {
    stop();
    vi.useRealTimers();
  });

  it('connects, joins without a number the first time, and shows the snapshot', async () => {
    const armed = processTimer();
    socket.answers['day:join'] = () => joined(3, [armed]);
    start();
    await flush();
    expect(socket.joins()).toEqual([{ dayId: DAY_ID }]);
    expect(useLiveStore.getState()).toMatchObject({ connection: 'live', seq: 3, timers: { [armed.id]: armed } });
    expect(onDayChanged).toHaveBeenCalled();
  });

  it('on a gap joins again from the last number it has, and takes the new snapshot', async () => {
    const armed = processTimer();
    socket.answers['day:join'] = () => joined(3, [armed]);
    start();
    await flush();
    const boiling = move(move(armed, { type: 'water-heating' }, T0 + 1), { type: 'rolling-boil' }, T0 + 2);
    socket.answers['day:join'] = () => joined(5, [boiling]);
    socket.fire('day:event', journal(5, boiling, 'timer.boil-confirmed'));
    await flush();
    expect(socket.joins()).toEqual([{ dayId: DAY_ID }, { dayId: DAY_ID, sinceSeq: 3 }]);
    expect(useLiveStore.getState().seq).toBe(5);
    expect(useLiveStore.getState().timers[armed.id]?.state).toBe('running');
  });

  it('holds what arrives while a join is out, then applies what the snapshot did not cover', async () => {
    const armed = processTimer();
    let answer: (value: unknown) => void = () => undefined;
    socket.answers['day:join'] = () => new Promise((resolve) => (answer = resolve));
    start();
    await flush();
    const heating = move(armed, { type: 'water-heating' }, T0 + 1);
    socket.fire('day:event', journal(3, armed, 'timer.created'));
    socket.fire('day:event', journal(4, heating, 'timer.heating'));
    answer(joined(3, [armed]));
    await flush();
    expect(useLiveStore.getState().seq).toBe(4);
    expect(useLiveStore.getState().timers[armed.id]?.state).toBe('waiting-for-boil');
    expect(socket.joins()).toHaveLength(1);
  });

  it('after the link drops, says so, and on reconnect asks for what it missed', async () => {
    socket.answers['day:join'] = () => joined(6);
    start();
    await flush();
    socket.drop();
    expect(useLiveStore.getState().connection).toBe('reconnecting');
    socket.connect();
    await flush();
    expect(socket.joins().at(-1)).toEqual({ dayId: DAY_ID, sinceSeq: 6 });
    expect(useLiveStore.getState().connection).toBe('live');
  });

  it('goes offline at once when the browser loses the network, and catches up when it returns', async () => {
    socket.answers['day:join'] = () => joined(2);
    start();
    await flush();
    window.dispatchEvent(new Event('offline'));
    expect(socket.connected).toBe(false);
    expect(useLiveStore.getState().connection).toBe('offline');
    window.dispatchEvent(new Event('online'));
    await flush();
    expect(socket.joins().at(-1)).toEqual({ dayId: DAY_ID, sinceSeq: 2 });
  });

  it('refreshes the day’s REST view when a load is added', async () => {
    socket.answers['day:join'] = () => joined(1);
    start();
    await flush();
    onDayChanged.mockReset();
    const entry: JournalEvent = { ...journal(2, processTimer()), type: 'load.created', payload: { load: {} } };
    socket.fire('day:event', entry);
    expect(onDayChanged).toHaveBeenCalledTimes(1);
  });

  it('renews the token when the server says it ran out, on the same connection', async () => {
    socket.answers['day:join'] = () => joined(1);
    socket.answers['session:renew'] = () => ({ data: { expiresAt: T0 + 900_000 } });
    start();
    await flush();
    socket.fire('session:expired', { message: 'Your sign-in ran out' });
    await flush();
    expect(socket.sent.filter((s) => s.event === 'session:renew').map((s) => s.payload)).toEqual([
      { token: 'token-2' },
    ]);
  });

  it('stands refused when the server will not let this person into the day', async () => {
    socket.answers['day:join'] = () => ({ error: { code: 'not_found', message: 'Canning day not found' } });
    start();
    await flush();
    expect(useLiveStore.getState()).toMatchObject({ connection: 'refused', problem: 'Canning day not found' });
  });

  it('estimates the clock offset from the pings (RFC 5905): a server 5 s ahead, 20 ms each way', async () => {
    socket.answers['day:join'] = () => joined(1);
    // The answer takes 40 ms to come back; the server stamps its receipt 20 ms in, on a clock 5 s ahead.
    socket.answers['clock:ping'] = ({ t1 }: { t1: number }) =>
      new Promise((resolve) => setTimeout(() => resolve({ data: { t1, t2: t1 + 5_020, t3: t1 + 5_020 } }), 40));
    start();
    await vi.advanceTimersByTimeAsync(40);
    expect(useLiveStore.getState()).toMatchObject({ clockOffsetMs: 5_000, clockDelayMs: 40 });
  });
});
