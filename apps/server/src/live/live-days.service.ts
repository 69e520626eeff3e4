import type {
  Ack,
  DayJoined,
  JournalEvent,
  LiveError,
  StepConfirmPayload,
  StepMark,
  TimerAnswer,
} from '@jarday/contracts';
import type { NewTimer, TimerCommand } from '@jarday/live';
import { Injectable } from '@nestjs/common';
import type { Socket } from 'socket.io';
import type { AuthUser } from '../auth/auth.decorators.js';
import { DaysRepository } from '../days/days.repository.js';
import { toLoadView } from '../days/days.service.js';
import { StepsRepository } from '../days/steps.repository.js';
import { CommandLedger } from '../journal/command-ledger.js';
import { JournalRepository } from '../journal/journal.repository.js';
import { KitchensRepository } from '../kitchens/kitchens.repository.js';
import { dayRoom, LivePublisher } from '../realtime/live-publisher.js';
import { type LiveActor, TimersService } from '../timers/timers.service.js';

/** What the gateway keeps on each socket. */
export interface SocketSession {
  user: AuthUser;
  deviceId: string;
  /** When the access token the device connected with (or renewed to) runs out, epoch ms. */
  expiresAt: number;
  /** The days this socket joined, with their kitchen. */
  days: Map<string, string>;
}

/** How many missed entries a reconnecting device is sent; beyond that it redraws from the snapshot. */
export const MAX_MISSED = 1000;

const notFound = (): { error: LiveError } => ({ error: { code: 'not_found', message: 'Canning day not found' } });
const notJoined = (): { error: LiveError } => ({
  error: { code: 'not_joined', message: 'Join the day first (day:join)' },
});

/**
 * The rules of who may see and run which day. Every call looks the member's role up again, so a role changed or
 * a member removed mid-day takes effect on the next tap.
 */
@Injectable()
export class LiveDaysService {
  constructor(
    private readonly days: DaysRepository,
    private readonly kitchens: KitchensRepository,
    private readonly journal: JournalRepository,
    private readonly timers: TimersService,
    private readonly steps: StepsRepository,
    private readonly ledger: CommandLedger,
    private readonly publisher: LivePublisher,
  ) {}

  /**
   * Joins the day's room, then reads the snapshot and the missed entries in the same synchronous turn: nothing can
   * be published between, so the device has every entry either in the answer or from the room, never neither.
   */
  join(
    socket: Socket<never, never, never, SocketSession>,
    dayId: string,
    sinceSeq: number | undefined,
  ): Ack<DayJoined> {
    const day = this.days.findDayById(dayId);
    if (!day || !this.kitchens.findMembership(day.kitchenId, socket.data.user.id)) return notFound();
    void socket.join(dayRoom(dayId));
    socket.data.days.set(dayId, day.kitchenId);
    const { timers, seq } = this.timers.snapshot(dayId);
    const from = sinceSeq ?? seq;
    const complete = seq - from <= MAX_MISSED;
    return {
      data: {
        snapshot: { dayId, seq, serverTime: Date.now(), timers, steps: this.steps.listForDay(dayId) },
        missed: complete && from < seq ? this.journal.since(dayId, from, MAX_MISSED) : [],
        missedComplete: complete,
      },
    };
  }

  leave(socket: Socket<never, never, never, SocketSession>, dayId: string): Ack<{ dayId: string }> {
    void socket.leave(dayRoom(dayId));
    socket.data.days.delete(dayId);
    return { data: { dayId } };
  }

  async start(session: SocketSession, dayId: string, commandId: string, timer: NewTimer): Promise<Ack<TimerAnswer>> {
    const actor = this.actor(session, dayId);
    if ('error' in actor) return actor;
    // A process timer belongs to a load and is made with it, from the plan: a device cannot bring its own minutes.
    if (timer.kind === 'process' || timer.kind === 'pressure-process') {
      return {
        error: { code: 'invalid_input', message: 'Process timers come with their load, timed from its tested plan' },
      };
    }
    // The cooling rest of a load starts when its jars are lifted out: the moment the band gate counts from.
    if (timer.kind === 'cooling-rest' && timer.loadId) {
      const loadId = timer.loadId;
      return this.timers.start(dayId, commandId, timer, actor, (now) => this.lift(dayId, loadId, actor, now));
    }
    return this.timers.start(dayId, commandId, timer, actor);
  }

  private lift(dayId: string, loadId: string, actor: LiveActor, now: number): { error: LiveError } | JournalEvent[] {
    const load = this.days.findLoad(dayId, loadId);
    if (!load) return { error: { code: 'not_found', message: 'No such load on this day' } };
    if (load.liftedAt) {
      return { error: { code: 'invalid_state', message: `Load ${load.number} was already lifted out and is cooling` } };
    }
    this.days.setLifted(dayId, loadId, new Date(now));
    const lifted = { ...load, liftedAt: new Date(now) };
    return [
      this.journal.append({
        dayId,
        at: now,
        actor: { userId: actor.userId, name: actor.name },
        deviceId: actor.deviceId,
        type: 'load.lifted',
        payload: { load: toLoadView(lifted) },
      }),
    ];
  }

  async command(
    session: SocketSession,
    dayId: string,
    commandId: string,
    timerId: string,
    command: TimerCommand,
  ): Promise<Ack<TimerAnswer>> {
    const actor = this.actor(session, dayId);
    if ('error' in actor) return actor;
    return this.timers.command(dayId, commandId, timerId, command, actor);
  }

  /** A tick in the step guide, for a batch or a load of this day; a journal entry like every other change. */
  async confirmStep(
    session: SocketSession,
    p: StepConfirmPayload & { done: boolean },
  ): Promise<Ack<{ mark: StepMark }>> {
    const actor = this.actor(session, p.dayId);
    if ('error' in actor) return actor;
    if (actor.role === 'watcher') {
      return {
        error: { code: 'forbidden', message: 'Watchers follow the board; only a lead or a helper ticks steps.' },
      };
    }
    const { answer, events } = await this.ledger.once<{ mark: StepMark }>(
      'step:confirm',
      p.dayId,
      p.commandId,
      actor.userId,
      p,
      () => {
        const subject = p.loadId ? ('load' as const) : ('batch' as const);
        const subjectId = (p.loadId ?? p.batchId)!;
        const found =
          subject === 'load' ? this.days.findLoad(p.dayId, subjectId) : this.days.findBatch(p.dayId, subjectId);
        if (!found) return { error: { code: 'not_found', message: `No such ${subject} on this day` } };
        if (this.days.findDayById(p.dayId)?.status !== 'open') {
          return { error: { code: 'invalid_state', message: 'This canning day is closed: its record is read-only.' } };
        }
        const mark: StepMark = {
          subject,
          subjectId,
          step: p.step,
          done: p.done,
          at: Date.now(),
          by: { userId: actor.userId, name: actor.name },
        };
        this.steps.upsert(p.dayId, mark);
        const event = this.journal.append({
          dayId: p.dayId,
          at: mark.at,
          actor: mark.by,
          deviceId: actor.deviceId,
          type: p.done ? 'step.confirmed' : 'step.undone',
          payload: { mark },
        });
        return { data: { mark }, events: [event] };
      },
    );
    this.publisher.publish(events);
    return answer;
  }

  private actor(session: SocketSession, dayId: string): LiveActor | { error: LiveError } {
    const kitchenId = session.days.get(dayId);
    if (!kitchenId) return notJoined();
    const member = this.kitchens.findMembership(kitchenId, session.user.id);
    if (!member) return notFound();
    return { userId: session.user.id, name: session.user.name, deviceId: session.deviceId, role: member.role };
  }
}
