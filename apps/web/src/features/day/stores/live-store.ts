import type { DayJoined, DaySnapshot, StepMark, Timer } from '@jarday/contracts';
import { create } from 'zustand';
import {
  applySnapshot,
  emptyDay,
  mergeMark,
  mergeTimer,
  receiveEvent,
  type LiveDayData,
  type ReceiveOutcome,
} from '../utils/live-state';

/**
 * `connecting` before the first answer; `live` once joined; `reconnecting` after the link dropped (socket.io tries
 * again by itself); `offline` while the browser says there is no network; `refused` when the server would not let
 * this person into the day.
 */
export type LiveConnection = 'idle' | 'connecting' | 'live' | 'reconnecting' | 'offline' | 'refused';

interface LiveState extends LiveDayData {
  connection: LiveConnection;
  /** Device time (epoch ms) of the last snapshot or event: "last synced at" on the banner. */
  lastSyncAt: number | null;
  /** Server time minus device time, from the NTP-style pings. */
  clockOffsetMs: number;
  /** The round trip of the sample the offset came from; null before the first. */
  clockDelayMs: number | null;
  problem: string | null;
  reset: (dayId: string) => void;
  setConnection: (connection: LiveConnection, problem?: string | null) => void;
  applyJoined: (joined: DayJoined, now?: number) => void;
  applySnapshot: (snapshot: DaySnapshot, now?: number) => void;
  receive: (event: unknown, now?: number) => ReceiveOutcome;
  /** A timer from a command's answer: it may arrive before its broadcast, and the newer copy wins either way. */
  putTimer: (timer: Timer) => void;
  /** A tick from `step:confirm`'s answer, the same way. */
  putMark: (mark: StepMark) => void;
  setClock: (offsetMs: number, delayMs: number) => void;
}

/** The live day this tab shows, fed by the socket (see `startLiveSync`). */
export const useLiveStore = create<LiveState>()((set, get) => ({
  ...emptyDay(),
  connection: 'idle',
  lastSyncAt: null,
  clockOffsetMs: 0,
  clockDelayMs: null,
  problem: null,
  reset: (dayId) => {
    // The clock estimate belongs to the device, not the day: keep it.
    if (get().dayId !== dayId) set({ ...emptyDay(dayId), connection: 'connecting', lastSyncAt: null, problem: null });
  },
  setConnection: (connection, problem = null) => set({ connection, problem }),
  applyJoined: (joined, now = Date.now()) => {
    // The snapshot already holds the effect of every missed entry; the entries themselves matter to the REST views.
    set((s) => ({ ...applySnapshot(s, joined.snapshot), connection: 'live', problem: null, lastSyncAt: now }));
  },
  applySnapshot: (snapshot, now = Date.now()) => set((s) => ({ ...applySnapshot(s, snapshot), lastSyncAt: now })),
  receive: (event, now = Date.now()) => {
    const { data, outcome } = receiveEvent(get(), event);
    if (outcome === 'applied') set({ ...data, lastSyncAt: now });
    return outcome;
  },
  putTimer: (timer) => {
    if (timer.dayId === get().dayId) set((s) => ({ timers: mergeTimer(s.timers, timer) }));
  },
  putMark: (mark) => set((s) => ({ marks: mergeMark(s.marks, mark) })),
  setClock: (clockOffsetMs, clockDelayMs) => set({ clockOffsetMs, clockDelayMs }),
}));

/** The timers of the day in a stable order: oldest first. */
export function sortedTimers(timers: Record<string, Timer>): Timer[] {
  return Object.values(timers).sort((a, b) => a.createdAt - b.createdAt || a.id.localeCompare(b.id));
}
