import type { AttachmentSubject, JarOutcome, LotEntryKind, ReminderKind, SealResult } from '@jarday/contracts';
import { index, integer, primaryKey, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { batches, days, loads } from './days.js';
import { kitchens } from './kitchens.js';
import { users } from './users.js';

/** The seal check of one jar of a load: jars are numbered 1..n within their load, the number on its label. */
export const sealChecks = sqliteTable(
  'seal_checks',
  {
    loadId: text('load_id')
      .notNull()
      .references(() => loads.id, { onDelete: 'cascade' }),
    jarNumber: integer('jar_number').notNull(),
    dayId: text('day_id')
      .notNull()
      .references(() => days.id, { onDelete: 'cascade' }),
    result: text('result').$type<SealResult>().notNull(),
    /** What becomes of the jar: stored when sealed; fridge, reprocess or discard when not. */
    outcome: text('outcome').$type<JarOutcome>().notNull(),
    checkedAt: integer('checked_at', { mode: 'timestamp_ms' }).notNull(),
    byUserId: text('by_user_id').references(() => users.id, { onDelete: 'set null' }),
    byName: text('by_name').notNull(),
  },
  (t) => [primaryKey({ columns: [t.loadId, t.jarNumber] }), index('seal_checks_day_idx').on(t.dayId)],
);

/** A pantry lot: the jars of one batch. `publicToken` is what a label's QR code carries, never the id. */
export const lots = sqliteTable(
  'lots',
  {
    id: text('id').primaryKey(),
    kitchenId: text('kitchen_id')
      .notNull()
      .references(() => kitchens.id, { onDelete: 'cascade' }),
    dayId: text('day_id')
      .notNull()
      .references(() => days.id, { onDelete: 'cascade' }),
    batchId: text('batch_id')
      .notNull()
      .references(() => batches.id, { onDelete: 'cascade' }),
    /** Printed on the label, e.g. 0823-B: the day's date and the batch's letter. Unique within the kitchen. */
    code: text('code').notNull(),
    publicToken: text('public_token').notNull(),
    /** Where the jars are kept ("cellar shelf 2"). */
    location: text('location'),
    /** YYYY-MM-DD: 12 months after the canning day. */
    bestBy: text('best_by').notNull(),
    /** Set by a spoilage report: every other jar of the lot needs a look. */
    flaggedAt: integer('flagged_at', { mode: 'timestamp_ms' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [
    uniqueIndex('lots_batch_idx').on(t.batchId),
    uniqueIndex('lots_kitchen_code_idx').on(t.kitchenId, t.code),
    uniqueIndex('lots_token_idx').on(t.publicToken),
  ],
);

/** What took jars off the shelf: eaten, given away (to whom), or reported spoiled. */
export const lotEntries = sqliteTable(
  'lot_entries',
  {
    id: text('id').primaryKey(),
    lotId: text('lot_id')
      .notNull()
      .references(() => lots.id, { onDelete: 'cascade' }),
    kind: text('kind').$type<LotEntryKind>().notNull(),
    jars: integer('jars').notNull(),
    recipient: text('recipient'),
    /** YYYY-MM-DD, as the person wrote it. */
    date: text('date').notNull(),
    note: text('note'),
    byUserId: text('by_user_id').references(() => users.id, { onDelete: 'set null' }),
    byName: text('by_name').notNull(),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [index('lot_entries_lot_idx').on(t.lotId)],
);

/** A photo or scanned document attached to a day, a load, a lot or a recipe; the bytes live in the storage. */
export const attachments = sqliteTable(
  'attachments',
  {
    id: text('id').primaryKey(),
    kitchenId: text('kitchen_id')
      .notNull()
      .references(() => kitchens.id, { onDelete: 'cascade' }),
    subject: text('subject').$type<AttachmentSubject>().notNull(),
    subjectId: text('subject_id').notNull(),
    fileName: text('file_name').notNull(),
    /** Sniffed from the content, never taken from the name or the browser. */
    mime: text('mime').notNull(),
    bytes: integer('bytes').notNull(),
    storageKey: text('storage_key').notNull(),
    thumbKey: text('thumb_key'),
    width: integer('width'),
    height: integer('height'),
    uploadedBy: text('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [index('attachments_subject_idx').on(t.kitchenId, t.subject, t.subjectId)],
);

/**
 * E-mail reminders that were claimed for sending. One row per load and kind: the unique index is what makes a
 * reminder go out once, across restarts and races.
 */
export const reminders = sqliteTable(
  'reminders',
  {
    id: text('id').primaryKey(),
    kitchenId: text('kitchen_id')
      .notNull()
      .references(() => kitchens.id, { onDelete: 'cascade' }),
    loadId: text('load_id')
      .notNull()
      .references(() => loads.id, { onDelete: 'cascade' }),
    kind: text('kind').$type<ReminderKind>().notNull(),
    dueAt: integer('due_at', { mode: 'timestamp_ms' }).notNull(),
    claimedAt: integer('claimed_at', { mode: 'timestamp_ms' }).notNull(),
    sentAt: integer('sent_at', { mode: 'timestamp_ms' }),
    recipients: integer('recipients').notNull().default(0),
    /** Why nothing was sent (nobody wants reminders; the bands were already off), or the last SMTP error. */
    note: text('note'),
  },
  (t) => [uniqueIndex('reminders_load_kind_idx').on(t.loadId, t.kind)],
);
