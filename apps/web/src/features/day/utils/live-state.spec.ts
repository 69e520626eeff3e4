import type { DaySnapshot, StepMark } from '@jarday/contracts';
import { MINUTE_MS } from '@jarday/live';
import { beforeEach, describe, expect, it } from 'vitest';
import { useLiveStore } from '../stores/live-store';
import { DAY_ID, journal, LOAD_ID, move, processTimer, T0, timer } from '../testing/day-fixtures';

const snapshot = (seq: number, timers = [processTimer()], steps: StepMark[] = []): DaySnapshot => ({
  dayId: DAY_ID,
  seq,
  serverTime: T0,
  timers,
  steps,
});
const store = () => useLiveStore.getState();

describe('the live store', () => {
  beforeEach(() => {
    useLiveStore.setState({ dayId: null, seq: 0, timers: {}, connection: 'idle', lastSyncAt: null });
    store().reset(DAY_ID);
  });

  it('takes a snapshot whole: its timers and its number', () => {
    const armed = processTimer();
    store().applyJoined({ snapshot: snapshot(4, [armed]), missed: [], missedComplete: true }, T0 + 5);
    expect(store()).toMatchObject({ dayId: DAY_ID, seq: 4, connection: 'live', lastSyncAt: T0 + 5 });
    expect(Object.values(store().timers)).toEqual([armed]);
  });

  it('applies the next numbers in order and each one’s timer as it stood after the change', () => {
    const armed = processTimer();
    store().applyJoined({ snapshot: snapshot(4, [armed]), missed: [], missedComplete: true });
    const heating = move(armed, { type: 'water-heating' }, T0 + 1000);
    const boiling = move(heating, { type: 'rolling-boil' }, T0 + 2000);
    expect(store().receive(journal(5, heating, 'timer.heating'))).toBe('applied');
    expect(store().receive(journal(6, boiling, 'timer.boil-confirmed'))).toBe('applied');
    expect(store().seq).toBe(6);
    expect(store().timers[armed.id]).toMatchObject({ state: 'running', deadlineAt: T0 + 2000 + 10 * MINUTE_MS });
  });

  it('ignores a duplicate or an entry older than the snapshot, changing nothing', () => {
    const armed = processTimer();
    const heating = move(armed, { type: 'water-heating' }, T0 + 1000);
    store().applyJoined({ snapshot: snapshot(5, [heating]), missed: [], missedComplete: true });
    const before = store().timers;
    // Entry 3 carried the timer still armed: applying it would move the board backwards.
    expect(store().receive(journal(3, armed, 'timer.created'))).toBe('duplicate');
    expect(store().receive(journal(5, heating, 'timer.heating'))).toBe('duplicate');
    expect(store().timers).toBe(before);
    expect(store().seq).toBe(5);
  });

  it('reports a gap without applying the entry beyond it', () => {
    const armed = processTimer();
    store().applyJoined({ snapshot: snapshot(4, [armed]), missed: [], missedComplete: true });
    const heating = move(armed, { type: 'water-heating' }, T0 + 1000);
    expect(store().receive(journal(6, heating, 'timer.heating'))).toBe('gap');
    expect(store().seq).toBe(4);
    expect(store().timers[armed.id]?.state).toBe('armed');
  });

  it('refuses entries of another day and anything that is not a journal entry', () => {
    store().applyJoined({ snapshot: snapshot(1), missed: [], missedComplete: true });
    const other = journal(
      2,
      timer({ kind: 'blanch', label: 'Dip', durationMs: 30_000 }),
      'timer.created',
      'aaaaaaaa-bbbb-4ccc-8ddd-eeeeeeeeeeee',
    );
    expect(store().receive(other)).toBe('other-day');
    expect(store().receive({ seq: 2, type: 'timer.started' })).toBe('invalid');
    expect(store().seq).toBe(1);
  });

  it('counts a non-timer entry (a new load) without touching the timers', () => {
    store().applyJoined({ snapshot: snapshot(1), missed: [], missedComplete: true });
    const before = store().timers;
    const entry = { ...journal(2, processTimer()), type: 'load.created', payload: { load: { id: 'x' } } };
    expect(store().receive(entry)).toBe('applied');
    expect(store().seq).toBe(2);
    expect(store().timers).toBe(before);
  });

  it('keeps the newer copy when a command’s answer and its broadcast cross', () => {
    const armed = processTimer();
    store().applyJoined({ snapshot: snapshot(1, [armed]), missed: [], missedComplete: true });
    const heating = move(armed, { type: 'water-heating' }, T0 + 1000);
    const boiling = move(heating, { type: 'rolling-boil' }, T0 + 2000);
    store().putTimer(boiling);
    expect(store().receive(journal(2, heating, 'timer.heating'))).toBe('applied');
    expect(store().timers[armed.id]?.state).toBe('running');
    expect(store().seq).toBe(2);
  });

  it('a later snapshot replaces the picture; an older one for the same day is ignored', () => {
    const armed = processTimer();
    store().applyJoined({ snapshot: snapshot(7, [armed]), missed: [], missedComplete: true });
    store().applySnapshot(snapshot(3, []));
    expect(store().seq).toBe(7);
    store().applySnapshot(snapshot(9, []));
    expect(store()).toMatchObject({ seq: 9, timers: {} });
  });

  it('takes the step ticks from the snapshot, then follows ticks and unticks in order', () => {
    const by = { userId: 'user-helper-bo', name: 'Bo' };
    const fill: StepMark = { subject: 'load', subjectId: LOAD_ID, step: 'fill', done: true, at: T0, by };
    store().applyJoined({ snapshot: snapshot(2, [], [fill]), missed: [], missedComplete: true });
    expect(Object.values(store().marks)).toEqual([fill]);
    const headspace = { ...fill, step: 'headspace' as const, at: T0 + 10 };
    const entry = (seq: number, type: string, mark: StepMark) => ({
      ...journal(seq, processTimer()),
      type,
      payload: { mark },
    });
    expect(store().receive(entry(3, 'step.confirmed', headspace))).toBe('applied');
    expect(store().receive(entry(4, 'step.undone', { ...fill, done: false, at: T0 + 20 }))).toBe('applied');
    expect(store().marks[`load:${LOAD_ID}:fill`]?.done).toBe(false);
    expect(store().marks[`load:${LOAD_ID}:headspace`]?.done).toBe(true);
    // An answer that arrives after a newer broadcast does not undo it.
    store().putMark(fill);
    expect(store().marks[`load:${LOAD_ID}:fill`]?.done).toBe(false);
  });
});
