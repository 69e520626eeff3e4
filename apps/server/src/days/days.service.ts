import { randomUUID } from 'node:crypto';
import {
  type BatchView,
  type createBatchSchema,
  type createDaySchema,
  type createLoadSchema,
  type DaySummaryView,
  type DayView,
  type JournalActor,
  type JournalEvent,
  type LoadView,
  type Role,
  rulesOf,
} from '@jarday/contracts';
import { JAR_SIZE_LABELS, jarsFromProduce, planProcess, type ProcessPlan } from '@jarday/rules';
import { Injectable } from '@nestjs/common';
import type { z } from 'zod';
import { type CannerRow, CannersRepository } from '../canners/canners.repository.js';
import { AppError, notFound } from '../common/app-error.js';
import { JournalRepository } from '../journal/journal.repository.js';
import { KitchensRepository } from '../kitchens/kitchens.repository.js';
import { LivePublisher } from '../realtime/live-publisher.js';
import { RecipesService } from '../recipes/recipes.service.js';
import { TimersService } from '../timers/timers.service.js';
import { type BatchRow, type DayRow, DaysRepository, type LoadRow } from './days.repository.js';
import { toBatchView, toLoadView, toSummary } from './day-views.js';

export { toLoadView } from './day-views.js';

/** Who did something, from where: the journal keeps both. */
export interface Actor extends JournalActor {
  deviceId: string | null;
  role: Role;
}

@Injectable()
export class DaysService {
  constructor(
    private readonly days: DaysRepository,
    private readonly journal: JournalRepository,
    private readonly kitchens: KitchensRepository,
    private readonly canners: CannersRepository,
    private readonly recipes: RecipesService,
    private readonly publisher: LivePublisher,
    private readonly timers: TimersService,
  ) {}

  /** A new day snapshots the kitchen's altitude: moving the kitchen later leaves past days as they were. */
  create(kitchenId: string, input: z.output<typeof createDaySchema>, actor: Actor, now = new Date()): DayView {
    const kitchen = this.kitchens.findKitchen(kitchenId);
    if (!kitchen) throw notFound('Kitchen');
    const id = randomUUID();
    const events = this.days.transaction(() => {
      this.days.insertDay({
        id,
        kitchenId,
        date: input.date,
        title: input.title,
        altitudeValue: kitchen.altitudeValue,
        altitudeUnit: kitchen.altitudeUnit,
        status: 'open',
        lastSeq: 0,
        createdBy: actor.userId,
        createdAt: now,
        closedAt: null,
      });
      return [this.record(id, actor, now, 'day.opened', { date: input.date, title: input.title })];
    });
    this.publisher.publish(events);
    return this.get(kitchenId, id);
  }

  list(kitchenId: string, status: DayRow['status'] | undefined, limit: number): DaySummaryView[] {
    return this.days.listDays(kitchenId, status, limit).map((r) => toSummary(r.day, r));
  }

  get(kitchenId: string, dayId: string): DayView {
    const day = this.requireDay(kitchenId, dayId);
    return {
      ...toSummary(day, this.days.countsFor(dayId)),
      batches: this.days.listBatches(dayId).map(toBatchView),
      loads: this.days.listLoads(dayId).map(toLoadView),
      seq: this.journal.lastSeq(dayId),
    };
  }

  close(kitchenId: string, dayId: string, actor: Actor, now = new Date()): DayView {
    this.requireOpenDay(kitchenId, dayId);
    const events = this.days.transaction(() => {
      if (!this.days.closeDay(dayId, now)) throw dayClosed();
      return [this.record(dayId, actor, now, 'day.closed', {})];
    });
    this.publisher.publish(events);
    return this.get(kitchenId, dayId);
  }

  /** A recipe at a scale; the recipe is copied in, so the day's record stays true if the recipe changes later. */
  addBatch(
    kitchenId: string,
    dayId: string,
    input: z.output<typeof createBatchSchema>,
    actor: Actor,
    now = new Date(),
  ): BatchView {
    this.requireOpenDay(kitchenId, dayId);
    const recipe = this.recipes.get(kitchenId, input.recipeId);
    const { id: _i, kitchenId: _k, copiedFrom: _c, createdAt: _a, updatedAt: _u, ...data } = recipe;
    let jars = input.jars;
    if (jars === undefined && input.produce) {
      const count = jarsFromProduce(rulesOf(data), input.jarSize, input.produce);
      if (!count.ok) throw new AppError('plan_refused', count.reason.message);
      jars = count.count.jarsToPrepare;
    }
    const row: BatchRow = {
      id: randomUUID(),
      dayId,
      recipeId: recipe.id,
      recipe: data,
      jarSize: input.jarSize,
      pack: input.pack,
      jars: jars ?? 1,
      createdAt: now,
    };
    const events = this.days.transaction(() => {
      this.days.insertBatch(row);
      return [this.record(dayId, actor, now, 'batch.added', { batch: toBatchView(row) })];
    });
    this.publisher.publish(events);
    return toBatchView(row);
  }

  /**
   * Jars of one batch in one canner. The process plan comes from the rules for the batch's recipe, jar and pack at
   * the day's altitude in that canner; a plan the rules refuse is refused here with their reason.
   */
  addLoad(
    kitchenId: string,
    dayId: string,
    input: z.output<typeof createLoadSchema>,
    actor: Actor,
    now = new Date(),
  ): LoadView {
    const day = this.requireOpenDay(kitchenId, dayId);
    const batch = this.days.findBatch(dayId, input.batchId);
    if (!batch) throw notFound('Batch');
    const canner = this.canners.find(kitchenId, input.cannerId);
    if (!canner) throw notFound('Canner');
    const plan = this.planLoad(day, batch, canner, input.jars);
    const { row, events } = this.days.transaction(() =>
      this.insertLoadInTransaction({ day, batch, canner, jars: input.jars, plan, actor, now }),
    );
    this.timers.publish(events);
    return toLoadView(row);
  }

  /**
   * The full process plan for jars of a batch in a canner at the day's altitude, or the rules' refusal; also
   * refused when the canner cannot hold that many jars of the batch's size.
   */
  planLoad(day: DayRow, batch: BatchRow, canner: CannerRow, jars: number): ProcessPlan {
    const result = planProcess({
      recipe: rulesOf(batch.recipe),
      jarSize: batch.jarSize,
      pack: batch.pack,
      altitude: { value: day.altitudeValue, unit: day.altitudeUnit },
      canner,
    });
    if (!result.ok) throw new AppError('plan_refused', result.reason.message);
    const capacity = canner.capacity[batch.jarSize] ?? 0;
    if (jars > capacity) {
      throw new AppError(
        'load_too_big',
        `${canner.name} holds ${capacity} ${JAR_SIZE_LABELS[batch.jarSize].toLowerCase()} jars at a time, not ${jars}`,
      );
    }
    return result.plan;
  }

  /**
   * Inserts a planned load with its `load.created` entry and its process timer; call inside the caller's
   * transaction and hand the returned events to `TimersService.publish` after the commit (it also arms the timer).
   * A reprocessing load names the load whose jars it carries again.
   */
  insertLoadInTransaction(args: {
    day: DayRow;
    batch: BatchRow;
    canner: CannerRow;
    jars: number;
    plan: ProcessPlan;
    actor: Actor;
    now: Date;
    reprocessOf?: LoadRow;
  }): { row: LoadRow; events: JournalEvent[] } {
    const { day, batch, canner, plan, actor, now, reprocessOf } = args;
    const load: LoadRow = {
      id: randomUUID(),
      dayId: day.id,
      batchId: batch.id,
      cannerId: canner.id,
      cannerName: canner.name,
      method: canner.method,
      jars: args.jars,
      number: this.days.nextLoadNumber(day.id),
      plan,
      liftedAt: null,
      reprocessOf: reprocessOf?.id ?? null,
      bandsOffAt: null,
      bandsOffBy: null,
      bandsOffOverride: null,
      createdAt: now,
    };
    this.days.insertLoad(load);
    const created = this.record(day.id, actor, now, 'load.created', {
      load: toLoadView(load),
      ...(reprocessOf ? { reprocessOf: { loadId: reprocessOf.id, number: reprocessOf.number } } : {}),
    });
    const label = reprocessOf
      ? `Load ${load.number}: ${batch.recipe.name} (again, from load ${reprocessOf.number})`
      : `Load ${load.number}: ${batch.recipe.name}`;
    // The load's process timer takes its tested minutes from the plan, never from a device.
    const processTimer = this.timers.createInTransaction(
      day.id,
      {
        kind: load.method === 'pressure' ? 'pressure-process' : 'process',
        label: label.slice(0, 80),
        testedMs: plan.minutes * 60_000,
        loadId: load.id,
      },
      actor,
      now.getTime(),
    );
    return { row: load, events: [created, ...processTimer.events] };
  }

  /**
   * Opens a closed day again, inside the caller's transaction, with a `day.reopened` entry saying why: jars that
   * go back into a canner need their live timer, and a closed day refuses live commands.
   */
  reopenInTransaction(day: DayRow, actor: Actor, now: Date, why: Record<string, unknown>): JournalEvent[] {
    if (!this.days.reopenDay(day.id)) return [];
    return [this.record(day.id, actor, now, 'day.reopened', { closedAt: day.closedAt?.toISOString() ?? null, ...why })];
  }

  requireDay(kitchenId: string, dayId: string): DayRow {
    const day = this.days.findDay(kitchenId, dayId);
    if (!day) throw notFound('Canning day');
    return day;
  }

  requireOpenDay(kitchenId: string, dayId: string): DayRow {
    const day = this.requireDay(kitchenId, dayId);
    if (day.status !== 'open') throw dayClosed();
    return day;
  }

  /** One journal entry of a day by a person; call inside the transaction of the change it records. */
  record(dayId: string, actor: Actor, now: Date, type: string, payload: Record<string, unknown>): JournalEvent {
    return this.journal.append({
      dayId,
      at: now.getTime(),
      actor: { userId: actor.userId, name: actor.name },
      deviceId: actor.deviceId,
      type,
      payload,
    });
  }
}

const dayClosed = () =>
  new AppError('day_closed', 'This canning day is closed: its record can be read but not changed');
