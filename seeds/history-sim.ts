/**
 * A canning day replayed at invented times through the same pure state machines (@jarday/live) the live server
 * runs, stored in the rows its repositories write (days, journal, timers and steps repositories; their Nest classes
 * are not imported because `tsx` runs the seed without decorator support), so every timer and journal entry is what
 * the server would have written had the day happened. Only the clock is ours: each call says when it happened.
 */
import { randomUUID } from 'node:crypto';
import { type BatchView, type JournalActor, rulesOf, type StepKey, timerJournalPayload } from '@jarday/contracts';
import {
  applyTimerCommand,
  createTimer,
  fireDue,
  type LiveRole,
  type NewTimer,
  type Timer,
  type TimerCommand,
  type TimerResult,
} from '@jarday/live';
import { type JarSize, type PackStyle, planProcess } from '@jarday/rules';
import { and, eq, sql } from 'drizzle-orm';
import type { Db } from '../apps/server/src/db/database.js';
import { batches, days, journal, loads, steps, timers } from '../apps/server/src/db/schema/index.js';
import type { canners, recipes } from '../apps/server/src/db/schema/index.js';

/** A person at a device, as the journal names them. */
export interface SimActor extends JournalActor {
  role: LiveRole;
  deviceId: string;
}
type CannerRow = typeof canners.$inferSelect;
type RecipeRow = typeof recipes.$inferSelect;
type BatchRow = typeof batches.$inferSelect;
type LoadRow = typeof loads.$inferSelect;

/** The load as the journal's `load.*` payloads carry it (DaysService's toLoadView). */
const toLoadView = (l: LoadRow) => ({
  id: l.id,
  dayId: l.dayId,
  batchId: l.batchId,
  number: l.number,
  cannerId: l.cannerId,
  cannerName: l.cannerName,
  method: l.method,
  jars: l.jars,
  plan: l.plan,
  liftedAt: l.liftedAt?.toISOString() ?? null,
  createdAt: l.createdAt.toISOString(),
});

/** One day of a kitchen, driven call by call; `at` is always server epoch ms. */
export class DaySim {
  readonly loads: LoadRow[] = [];
  private readonly stored = new Map<string, Timer>();

  constructor(
    private readonly db: Db,
    readonly dayId: string,
  ) {}

  /** As DaysService.create: the day snapshots the kitchen's altitude. */
  open(
    kitchen: { id: string; altitudeValue: number; altitudeUnit: 'ft' | 'm' },
    title: string,
    by: SimActor,
    at: number,
  ) {
    const date = new Date(at).toISOString().slice(0, 10);
    this.db
      .insert(days)
      .values({
        id: this.dayId,
        kitchenId: kitchen.id,
        date,
        title,
        altitudeValue: kitchen.altitudeValue,
        altitudeUnit: kitchen.altitudeUnit,
        status: 'open',
        lastSeq: 0,
        createdBy: by.userId,
        createdAt: new Date(at),
        closedAt: null,
      })
      .run();
    this.record(by, at, 'day.opened', { date, title });
    return date;
  }

  close(by: SimActor, at: number): void {
    this.db
      .update(days)
      .set({ status: 'closed', closedAt: new Date(at) })
      .where(eq(days.id, this.dayId))
      .run();
    this.record(by, at, 'day.closed', {});
  }

  /** As DaysService.addBatch: the recipe is copied in. */
  addBatch(recipe: RecipeRow, jarSize: JarSize, pack: PackStyle, jars: number, by: SimActor, at: number): BatchRow {
    const row: BatchRow = {
      id: randomUUID(),
      dayId: this.dayId,
      recipeId: recipe.id,
      recipe: recipe.data,
      jarSize,
      pack,
      jars,
      createdAt: new Date(at),
    };
    this.db.insert(batches).values(row).run();
    const batch: BatchView = {
      id: row.id,
      dayId: row.dayId,
      recipeId: row.recipeId,
      recipeName: row.recipe.name,
      tested: row.recipe.tested,
      jarSize,
      pack,
      jars,
      createdAt: row.createdAt.toISOString(),
    };
    this.record(by, at, 'batch.added', { batch });
    return row;
  }

  /** As DaysService.addLoad: the plan comes from the rules, and the process timer is made from it, armed. */
  addLoad(
    batch: BatchRow,
    canner: CannerRow,
    jars: number,
    by: SimActor,
    at: number,
  ): { load: LoadRow; process: Timer } {
    const day = this.db.select().from(days).where(eq(days.id, this.dayId)).get()!;
    const result = planProcess({
      recipe: rulesOf(batch.recipe),
      jarSize: batch.jarSize,
      pack: batch.pack,
      altitude: { value: day.altitudeValue, unit: day.altitudeUnit },
      canner,
    });
    if (!result.ok) throw new Error(`seed: no plan for ${batch.recipe.name}: ${result.reason.message}`);
    const load: LoadRow = {
      id: randomUUID(),
      dayId: this.dayId,
      batchId: batch.id,
      cannerId: canner.id,
      cannerName: canner.name,
      method: canner.method,
      jars,
      number: this.loads.length + 1,
      plan: result.plan,
      liftedAt: null,
      reprocessOf: null,
      bandsOffAt: null,
      bandsOffBy: null,
      bandsOffOverride: null,
      createdAt: new Date(at),
    };
    this.db.insert(loads).values(load).run();
    this.loads.push(load);
    this.record(by, at, 'load.created', { load: toLoadView(load) });
    const process = this.create(
      {
        kind: load.method === 'pressure' ? 'pressure-process' : 'process',
        label: `Load ${load.number}: ${batch.recipe.name}`.slice(0, 80),
        testedMs: result.plan.minutes * 60_000,
        loadId: load.id,
      },
      by,
      at,
    );
    return { load, process };
  }

  /** As TimersService.start (and, for a load's cooling rest, LiveDaysService's lift in the same transaction). */
  create(input: NewTimer, by: SimActor, at: number): Timer {
    const result = createTimer(input, {
      now: at,
      actorRole: by.role,
      actorId: by.userId,
      timerId: randomUUID(),
      dayId: this.dayId,
    });
    if (!result.ok) throw new Error(`seed: timer refused: ${result.error.message}`);
    if (input.kind === 'cooling-rest' && input.loadId) {
      const load = this.loads.find((l) => l.id === input.loadId)!;
      this.db
        .update(loads)
        .set({ liftedAt: new Date(at) })
        .where(eq(loads.id, load.id))
        .run();
      load.liftedAt = new Date(at);
      this.record(by, at, 'load.lifted', { load: toLoadView(load) });
    }
    const t = result.timer;
    this.db
      .insert(timers)
      .values({ id: t.id, dayId: t.dayId, data: { ...t }, nextDeadlineAt: t.deadlineAt, version: t.version })
      .run();
    this.stored.set(t.id, t);
    return this.save(result, by);
  }

  /** As TimersService.command. */
  command(timer: Timer, command: TimerCommand, by: SimActor, at: number): Timer {
    const stored = this.stored.get(timer.id)!;
    const result = applyTimerCommand(stored, command, { now: at, actorRole: by.role, actorId: by.userId });
    if (!result.ok) throw new Error(`seed: ${command.type} refused: ${result.error.message}`);
    this.update(result.timer, stored.version);
    return this.save(result, by);
  }

  /** As TimersService.fire: the server's own firing at `at` (its timeout runs a little after the deadline). */
  fire(timer: Timer, at: number): Timer {
    const stored = this.stored.get(timer.id)!;
    const result = fireDue(stored, at);
    if (!result.ok) throw new Error(`seed: firing refused: ${result.error.message}`);
    this.update(result.timer, stored.version);
    return this.save(result, null);
  }

  /** As LiveDaysService.confirmStep. */
  tick(subject: 'batch' | 'load', subjectId: string, step: StepKey, by: SimActor, at: number): void {
    const mark = { subject, subjectId, step, done: true, at, by: { userId: by.userId, name: by.name } };
    const row = { dayId: this.dayId, subject, subjectId, step, done: true, at, byUserId: by.userId, byName: by.name };
    this.db
      .insert(steps)
      .values(row)
      .onConflictDoUpdate({ target: [steps.dayId, steps.subjectId, steps.step], set: row })
      .run();
    this.record(by, at, 'step.confirmed', { mark });
  }

  /** As TimersRepository.update: only over the version it was read at. */
  private update(t: Timer, readVersion: number): void {
    const changed = this.db
      .update(timers)
      .set({ data: { ...t }, nextDeadlineAt: t.deadlineAt, version: t.version })
      .where(and(eq(timers.id, t.id), eq(timers.version, readVersion)))
      .run().changes;
    if (changed !== 1) throw new Error('seed: timer version clash');
    this.stored.set(t.id, t);
  }

  private save(result: Extract<TimerResult, { ok: true }>, by: SimActor | null): Timer {
    for (const event of result.events) {
      this.append(by, event.at, event.type, { ...timerJournalPayload(event, result.timer) });
    }
    return result.timer;
  }

  private record(by: SimActor, at: number, type: string, payload: Record<string, unknown>): void {
    this.append(by, at, type, payload);
  }

  /** As JournalRepository.append: the day's next number, the server ("Jarday", no device) when nobody acted. */
  private append(by: SimActor | null, at: number, type: string, payload: Record<string, unknown>): void {
    const bumped = this.db
      .update(days)
      .set({ lastSeq: sql`${days.lastSeq} + 1` })
      .where(eq(days.id, this.dayId))
      .returning({ seq: days.lastSeq })
      .get();
    this.db
      .insert(journal)
      .values({
        dayId: this.dayId,
        seq: bumped.seq,
        at,
        actorId: by?.userId ?? null,
        actorName: by?.name ?? 'Jarday',
        deviceId: by?.deviceId ?? '',
        type,
        payload,
      })
      .run();
  }
}
