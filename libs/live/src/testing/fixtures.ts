// Invented ids and a fixed start time for the tests; the helpers throw on a refusal so a test reads as a story.
import { applyTimerCommand } from '../apply.js';
import type { CommandContext, NewTimer, TimerCommand, TimerResult } from '../commands.js';
import { MINUTE_MS } from '../constants.js';
import { createTimer } from '../create.js';
import type { LiveRole, Timer } from '../timer.js';

export const T0 = Date.UTC(2025, 8, 6, 8, 0, 0);
export const MIN = MINUTE_MS;
export const DAY_ID = '6f1c2a4e-8d3b-4c5a-9e7f-1a2b3c4d5e6f';
export const TIMER_ID = '0b7e9d2c-3f4a-4b5c-8d6e-7f8091a2b3c4';
export const LOAD_ID = 'c3d4e5f6-a7b8-4c9d-8e0f-112233445566';
export const LEAD = 'user-lead-ada';
export const HELPER = 'user-helper-bo';
export const WATCHER = 'user-watcher-cy';

const ACTORS: Record<LiveRole, string> = { lead: LEAD, helper: HELPER, watcher: WATCHER };

export function ctx(at: number, role: LiveRole = 'helper'): CommandContext {
  return { now: at, actorRole: role, actorId: ACTORS[role] };
}

export function expectOk(result: TimerResult): Extract<TimerResult, { ok: true }> {
  if (!result.ok) throw new Error(`Expected success, got ${result.error.code}: ${result.error.message}`);
  return result;
}

export function expectRefused(result: TimerResult): Extract<TimerResult, { ok: false }>['error'] {
  if (result.ok) throw new Error(`Expected a refusal, got state ${result.timer.state}`);
  return result.error;
}

/** A new timer made by a helper (or `role`) at `at`. */
export function make(input: NewTimer, at = T0, role: LiveRole = 'helper'): Timer {
  return expectOk(createTimer(input, { ...ctx(at, role), timerId: TIMER_ID, dayId: DAY_ID })).timer;
}

/** A 45-minute boiling-water process (quart jars of tomatoes in water, 0-1,000 ft; USDA Guide 3). */
export function boilingWater(testedMs = 45 * MIN): Timer {
  return make({ kind: 'process', label: 'Load 1: tomatoes, quarts', testedMs, loadId: LOAD_ID });
}

/** A 25-minute pressure process (an invented recipe time: these tests check the sequence, not the minutes). */
export function pressure(testedMs = 25 * MIN): Timer {
  return make({ kind: 'pressure-process', label: 'Load 2: pressure', testedMs });
}

/** Apply a command and insist it succeeds. */
export function run(timer: Timer, command: TimerCommand, at: number, role: LiveRole = 'helper'): Timer {
  return expectOk(applyTimerCommand(timer, command, ctx(at, role))).timer;
}

export const cmd = {
  start: { type: 'start' },
  pause: { type: 'pause' },
  resume: { type: 'resume' },
  cancel: { type: 'cancel' },
  heating: { type: 'water-heating' },
  boil: { type: 'rolling-boil' },
  boilLost: { type: 'boil-lost' },
  vent: { type: 'start-venting' },
  atPressure: { type: 'at-pressure' },
  pressureLost: { type: 'pressure-lost' },
  heatOff: { type: 'heat-off' },
  gaugeZero: { type: 'gauge-zero' },
  ack: { type: 'acknowledge' },
} as const satisfies Record<string, TimerCommand>;
