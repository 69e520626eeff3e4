import type { AltitudeUnit, CanningMethod, JarSize, PackStyle, ProcessPlan } from '@jarday/rules';
import type { RecipeData, StepKey } from '@jarday/contracts';
import { index, integer, primaryKey, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { canners, kitchens } from './kitchens.js';
import { users } from './users.js';

/** One canning day of a kitchen. The altitude is a snapshot: moving the kitchen later does not change a past day. */
export const days = sqliteTable(
  'days',
  {
    id: text('id').primaryKey(),
    kitchenId: text('kitchen_id')
      .notNull()
      .references(() => kitchens.id, { onDelete: 'cascade' }),
    /** The calendar date of the day in the kitchen, YYYY-MM-DD. */
    date: text('date').notNull(),
    title: text('title').notNull(),
    altitudeValue: real('altitude_value').notNull(),
    altitudeUnit: text('altitude_unit').$type<AltitudeUnit>().notNull(),
    status: text('status').$type<'open' | 'closed'>().notNull(),
    /** The last journal sequence number handed out; the next event gets lastSeq + 1. */
    lastSeq: integer('last_seq').notNull().default(0),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    closedAt: integer('closed_at', { mode: 'timestamp_ms' }),
  },
  (t) => [index('days_kitchen_idx').on(t.kitchenId, t.date)],
);

/** A recipe at a scale on a day. The recipe is copied in so the record stays true if the recipe changes later. */
export const batches = sqliteTable(
  'batches',
  {
    id: text('id').primaryKey(),
    dayId: text('day_id')
      .notNull()
      .references(() => days.id, { onDelete: 'cascade' }),
    recipeId: text('recipe_id').notNull(),
    recipe: text('recipe', { mode: 'json' }).$type<RecipeData>().notNull(),
    jarSize: text('jar_size').$type<JarSize>().notNull(),
    pack: text('pack').$type<PackStyle>().notNull(),
    jars: integer('jars').notNull(),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [index('batches_day_idx').on(t.dayId)],
);

/** Jars of one batch in one canner, with the process plan the rules gave for them. */
export const loads = sqliteTable(
  'loads',
  {
    id: text('id').primaryKey(),
    dayId: text('day_id')
      .notNull()
      .references(() => days.id, { onDelete: 'cascade' }),
    batchId: text('batch_id')
      .notNull()
      .references(() => batches.id, { onDelete: 'cascade' }),
    cannerId: text('canner_id').references(() => canners.id, { onDelete: 'set null' }),
    cannerName: text('canner_name').notNull(),
    method: text('method').$type<CanningMethod>().notNull(),
    jars: integer('jars').notNull(),
    /** 1, 2, 3... within the day, for labels and talk ("load 2 is boiling"). */
    number: integer('number').notNull(),
    plan: text('plan', { mode: 'json' }).$type<ProcessPlan>().notNull(),
    liftedAt: integer('lifted_at', { mode: 'timestamp_ms' }),
    /** A reprocessing load points at the load whose unsealed jars it carries again (new lids, the full time). */
    reprocessOf: text('reprocess_of'),
    /** When the bands came off, who took them off, and the lead's written reason if it was before 12 h. */
    bandsOffAt: integer('bands_off_at', { mode: 'timestamp_ms' }),
    bandsOffBy: text('bands_off_by'),
    bandsOffOverride: text('bands_off_override'),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [
    index('loads_day_idx').on(t.dayId),
    uniqueIndex('loads_day_number_idx').on(t.dayId, t.number),
    index('loads_reprocess_of_idx').on(t.reprocessOf),
  ],
);

/** Live timers: the timer document as JSON, and its next deadline as a column so a restart can re-arm them. */
export const timers = sqliteTable(
  'timers',
  {
    id: text('id').primaryKey(),
    dayId: text('day_id')
      .notNull()
      .references(() => days.id, { onDelete: 'cascade' }),
    data: text('data', { mode: 'json' }).$type<Record<string, unknown>>().notNull(),
    nextDeadlineAt: integer('next_deadline_at'),
    version: integer('version').notNull(),
  },
  (t) => [index('timers_day_idx').on(t.dayId), index('timers_deadline_idx').on(t.nextDeadlineAt)],
);

/** The append-only journal: every change of a day, numbered per day, written in the same transaction as the change. */
export const journal = sqliteTable(
  'journal',
  {
    dayId: text('day_id')
      .notNull()
      .references(() => days.id, { onDelete: 'cascade' }),
    seq: integer('seq').notNull(),
    at: integer('at').notNull(),
    actorId: text('actor_id'),
    actorName: text('actor_name').notNull(),
    deviceId: text('device_id').notNull(),
    type: text('type').notNull(),
    payload: text('payload', { mode: 'json' }).$type<Record<string, unknown>>().notNull(),
  },
  (t) => [primaryKey({ columns: [t.dayId, t.seq] })],
);

/** Commands already acted on, so a retried or doubled tap acts once and gets the first answer again. */
export const commandLedger = sqliteTable(
  'command_ledger',
  {
    commandId: text('command_id').primaryKey(),
    dayId: text('day_id')
      .notNull()
      .references(() => days.id, { onDelete: 'cascade' }),
    userId: text('user_id').notNull(),
    answer: text('answer', { mode: 'json' }).$type<unknown>().notNull(),
    at: integer('at').notNull(),
  },
  (t) => [index('command_ledger_day_idx').on(t.dayId)],
);

/** The step guide's ticks: one row per batch or load and step, the latest word on it. */
export const steps = sqliteTable(
  'steps',
  {
    dayId: text('day_id')
      .notNull()
      .references(() => days.id, { onDelete: 'cascade' }),
    subject: text('subject').$type<'batch' | 'load'>().notNull(),
    subjectId: text('subject_id').notNull(),
    step: text('step').$type<StepKey>().notNull(),
    done: integer('done', { mode: 'boolean' }).notNull(),
    at: integer('at').notNull(),
    byUserId: text('by_user_id').notNull(),
    byName: text('by_name').notNull(),
  },
  (t) => [primaryKey({ columns: [t.dayId, t.subjectId, t.step] })],
);
