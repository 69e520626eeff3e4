import { randomUUID } from 'node:crypto';
import { type Ack, type JournalEvent, type LiveError, type TimerAnswer, timerJournalPayload } from '@jarday/contracts';
import {
  applyTimerCommand,
  createTimer,
  fireDue,
  type LiveRole,
  type NewTimer,
  settle,
  type Timer,
  type TimerCommand,
  type TimerEvent,
  type TimerResult,
} from '@jarday/live';
import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { CommandLedger, type CommandOutcome } from '../journal/command-ledger.js';
import { JournalRepository } from '../journal/journal.repository.js';
import { LivePublisher } from '../realtime/live-publisher.js';
import { TimerScheduler } from './timer-scheduler.js';
import { TimersRepository } from './timers.repository.js';

/** Who is acting: a person on a device, with their role in the day's kitchen. */
export interface LiveActor {
  userId: string;
  name: string;
  deviceId: string;
  role: LiveRole;
}

const closedDay = (): LiveError => ({
  code: 'invalid_state',
  message: 'This canning day is closed: its timers are read-only.',
});
const noTimer = (): LiveError => ({ code: 'not_found', message: 'No such timer on this day.' });

/**
 * Runs the day's timers: commands and firings go through the pure core (@jarday/live), are stored with their
 * journal entries in one transaction, then published and scheduled. The server is the only clock that decides.
 */
@Injectable()
export class TimersService implements OnApplicationBootstrap {
  private readonly logger = new Logger('Timers');

  constructor(
    private readonly timers: TimersRepository,
    private readonly journal: JournalRepository,
    private readonly publisher: LivePublisher,
    private readonly scheduler: TimerScheduler,
    private readonly ledger: CommandLedger,
  ) {
    this.scheduler.setHandler((id) => this.fire(id));
  }

  /**
   * After a restart: fire at once every timer that came due while the server was down (marked late by the real
   * amount), and schedule the rest at their stored deadlines.
   */
  onApplicationBootstrap(): void {
    const now = Date.now();
    let late = 0;
    for (const stored of this.timers.listCounting()) {
      const { timer, events } = settle(stored, now);
      if (events.length > 0) {
        late += 1;
        this.publish(this.timers.transaction(() => this.save(timer, stored.version, events, null)));
      }
      this.scheduler.schedule(timer.id, timer.deadlineAt);
    }
    if (late > 0) this.logger.log(`Fired ${late} timer(s) that came due while the server was down`);
  }

  snapshot(dayId: string): { timers: Timer[]; seq: number } {
    return this.timers.transaction(() => ({ timers: this.timers.listForDay(dayId), seq: this.journal.lastSeq(dayId) }));
  }

  /**
   * A new timer on a day, from a device. `alongside` runs in the same transaction before the timer is made (lifting
   * a load with its cooling rest, say); its refusal refuses the command, its events go to the journal first.
   */
  start(
    dayId: string,
    commandId: string,
    input: NewTimer,
    actor: LiveActor,
    alongside?: (now: number) => { error: LiveError } | JournalEvent[],
  ): Promise<Ack<TimerAnswer>> {
    return this.once('timer:start', dayId, commandId, { input }, actor, () => {
      if (this.timers.dayStatus(dayId) !== 'open') return { error: closedDay() };
      const now = Date.now();
      const result = createTimer(input, {
        now,
        actorRole: actor.role,
        actorId: actor.userId,
        timerId: randomUUID(),
        dayId,
      });
      if (!result.ok) return { error: result.error };
      const before = alongside?.(now) ?? [];
      if (!Array.isArray(before)) return before;
      this.timers.insert(result.timer);
      return {
        data: { timer: result.timer, noop: false },
        events: [...before, ...this.record(result.events, result.timer, actor)],
      };
    });
  }

  /**
   * The server's own timer for a load (its process, with the tested minutes from the load's plan), created inside
   * the caller's transaction; the caller publishes the returned events after committing.
   */
  createInTransaction(
    dayId: string,
    input: NewTimer,
    actor: Omit<LiveActor, 'deviceId'> & { deviceId: string | null },
    now = Date.now(),
  ) {
    const result = createTimer(input, {
      now,
      actorRole: actor.role,
      actorId: actor.userId,
      timerId: randomUUID(),
      dayId,
    });
    if (!result.ok) throw new Error(`could not create the load's timer: ${result.error.message}`);
    this.timers.insert(result.timer);
    return { timer: result.timer, events: this.record(result.events, result.timer, actor) };
  }

  /** A verb on an existing timer: rolling boil, boil lost, pause, acknowledge... */
  command(
    dayId: string,
    commandId: string,
    timerId: string,
    command: TimerCommand,
    actor: LiveActor,
  ): Promise<Ack<TimerAnswer>> {
    return this.once('timer:command', dayId, commandId, { timerId, command }, actor, () => {
      // A cooling rest can ring after the day was closed (bands come off tomorrow): silencing it is always allowed.
      if (command.type !== 'acknowledge' && this.timers.dayStatus(dayId) !== 'open') return { error: closedDay() };
      const timer = this.timers.find(dayId, timerId);
      if (!timer) return { error: noTimer() };
      const result: TimerResult = applyTimerCommand(timer, command, {
        now: Date.now(),
        actorRole: actor.role,
        actorId: actor.userId,
      });
      if (!result.ok) return { error: result.error };
      if (result.noop || result.events.length === 0) return { data: { timer: result.timer, noop: true }, events: [] };
      return {
        data: { timer: result.timer, noop: false },
        events: this.save(result.timer, timer.version, result.events, actor),
      };
    });
  }

  /** The scheduler's call at a deadline. A stale timeout finds the timer not due and does nothing. */
  fire(timerId: string): void {
    const events = this.timers.transaction(() => {
      const timer = this.timers.findById(timerId);
      if (!timer) return [];
      const result = fireDue(timer, Date.now());
      if (!result.ok) return [];
      return this.save(result.timer, timer.version, result.events, null);
    });
    this.publish(events);
  }

  /** Publishes events after their transaction committed and re-arms the timers they touched. */
  publish(events: readonly JournalEvent[]): void {
    this.publisher.publish(events);
    const touched = new Map<string, Timer>();
    for (const e of events) {
      const payload = e.payload as { timer?: Timer };
      if (payload.timer) touched.set(payload.timer.id, payload.timer);
    }
    for (const timer of touched.values()) this.scheduler.schedule(timer.id, timer.deadlineAt);
  }

  private async once(
    event: string,
    dayId: string,
    commandId: string,
    payload: object,
    actor: LiveActor,
    act: () => CommandOutcome<TimerAnswer>,
  ): Promise<Ack<TimerAnswer>> {
    const { answer, events } = await this.ledger.once(event, dayId, commandId, actor.userId, payload, act);
    this.publish(events);
    return answer;
  }

  private save(
    timer: Timer,
    readVersion: number,
    events: TimerEvent[],
    actor: (Pick<LiveActor, 'userId' | 'name'> & { deviceId: string | null }) | null,
  ) {
    if (!this.timers.update(timer, readVersion)) throw new Error(`timer ${timer.id} changed underneath a command`);
    return this.record(events, timer, actor);
  }

  private record(
    events: TimerEvent[],
    timer: Timer,
    actor: (Pick<LiveActor, 'userId' | 'name'> & { deviceId: string | null }) | null,
  ) {
    return events.map((event) =>
      this.journal.append({
        dayId: timer.dayId,
        at: event.at,
        actor: actor ? { userId: actor.userId, name: actor.name } : null,
        deviceId: actor?.deviceId ?? null,
        type: event.type,
        payload: { ...timerJournalPayload(event, timer) },
      }),
    );
  }
}
