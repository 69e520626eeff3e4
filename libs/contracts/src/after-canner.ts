import { calendarDateSchema, type CanningMethod, type JarSize } from '@jarday/rules';
import { z } from 'zod';
import type { LoadView } from './days.js';
import { idSchema, type Role } from './kitchens.js';

/* ---------- cooling shelf and seal checks ---------- */

export const SEAL_RESULTS = ['sealed', 'unsealed', 'broken'] as const;
export const sealResultSchema = z.enum(SEAL_RESULTS, { error: `A seal is one of: ${SEAL_RESULTS.join(', ')}` });
export type SealResult = z.infer<typeof sealResultSchema>;

/** What becomes of a checked jar. A sealed jar is stored; an unsealed one goes to the fridge or is reprocessed. */
export const JAR_OUTCOMES = ['store', 'fridge', 'reprocess', 'discard'] as const;
export const jarOutcomeSchema = z.enum(JAR_OUTCOMES, { error: `An outcome is one of: ${JAR_OUTCOMES.join(', ')}` });
export type JarOutcome = z.infer<typeof jarOutcomeSchema>;

/** Which outcomes make sense for which result: a sealed jar is stored, a broken one discarded. */
export const OUTCOMES_BY_RESULT: Record<SealResult, readonly JarOutcome[]> = {
  sealed: ['store'],
  unsealed: ['fridge', 'reprocess'],
  broken: ['discard'],
};

const reasonSchema = z
  .string({ error: 'Write the reason' })
  .trim()
  .min(5, 'Write the reason in a few words (at least 5 characters)')
  .max(500, 'At most 500 characters');

/** Taking the bands off a load. Before 12 h it is refused unless a lead gives a written reason. */
export const bandsOffSchema = z.strictObject({
  override: z.strictObject({ reason: reasonSchema }).optional(),
});
export type BandsOffInput = z.input<typeof bandsOffSchema>;

export const sealCheckSchema = z
  .strictObject({
    jars: z
      .array(
        z.strictObject({
          jarNumber: z.int('Jar numbers are whole numbers').min(1).max(60),
          result: sealResultSchema,
          outcome: jarOutcomeSchema,
        }),
      )
      .min(1, 'Check at least one jar')
      .max(60),
  })
  .superRefine((body, ctx) => {
    const seen = new Set<number>();
    body.jars.forEach((jar, i) => {
      if (seen.has(jar.jarNumber)) {
        ctx.addIssue({
          code: 'custom',
          path: ['jars', i, 'jarNumber'],
          message: `Jar ${jar.jarNumber} is listed twice`,
        });
      }
      seen.add(jar.jarNumber);
      if (!OUTCOMES_BY_RESULT[jar.result].includes(jar.outcome)) {
        ctx.addIssue({
          code: 'custom',
          path: ['jars', i, 'outcome'],
          message: `A ${jar.result} jar can go to: ${OUTCOMES_BY_RESULT[jar.result].join(' or ')}`,
        });
      }
    });
  });
export type SealCheckInput = z.input<typeof sealCheckSchema>;

/** Reprocess the jars marked "reprocess" of a load, in a canner, with new lids and the full time. */
export const reprocessSchema = z.strictObject({ cannerId: idSchema });
export type ReprocessInput = z.input<typeof reprocessSchema>;

/**
 * A reprocessing load: the jars marked "reprocess" (jar k of the new load is the k-th of them by jar number), with
 * the full process time. `dayReopened` when the day had been closed: the jars need their live timer.
 */
export interface ReprocessAnswer {
  load: LoadView;
  original: CoolingLoadView;
  jarNumbers: number[];
  dayReopened: boolean;
}

export interface SealCheckView {
  jarNumber: number;
  result: SealResult;
  outcome: JarOutcome;
  checkedAt: string;
  byName: string;
}

/** One load on the cooling shelf, with the times the rules give from its lifting. */
export interface CoolingLoadView {
  loadId: string;
  dayId: string;
  dayDate: string;
  number: number;
  recipeName: string;
  jarSize: JarSize;
  jars: number;
  method: CanningMethod;
  cannerName: string;
  liftedAt: string;
  bandsEarliestAt: string;
  bandsRecommendedAt: string;
  reprocessDeadline: string;
  bandsOffAt: string | null;
  bandsOffOverride: string | null;
  reprocessOf: string | null;
  /** The load that carried this load's unsealed jars again, if any. */
  reprocessedBy: string | null;
  sealChecks: SealCheckView[];
  /** The pantry lot of the load's batch, made with the batch's first seal check. */
  lot: { id: string; code: string } | null;
}

export interface SealRate {
  checked: number;
  sealed: number;
  /** sealed / checked, or null before any check. */
  rate: number | null;
}

/** A canning day with loads on the shelf, and its seal rate so far. */
export interface CoolingDayView {
  dayId: string;
  date: string;
  title: string;
  status: 'open' | 'closed';
  sealRate: SealRate;
}

export interface CoolingShelfView {
  serverTime: string;
  loads: CoolingLoadView[];
  /** The days of the loads shown (or the one asked for), newest first. */
  days: CoolingDayView[];
}

/** `?dayId=`: every lifted load of that day, however old; without it the shelf of the last few days. */
export const coolingQuerySchema = z.strictObject({ dayId: idSchema.optional() });
export type CoolingQuery = z.input<typeof coolingQuerySchema>;

/* ---------- pantry ---------- */

export const LOT_ENTRY_KINDS = ['eaten', 'gift', 'spoiled'] as const;
export const lotEntryKindSchema = z.enum(LOT_ENTRY_KINDS);
export type LotEntryKind = z.infer<typeof lotEntryKindSchema>;

export const updateLotSchema = z.strictObject({
  location: z.string().trim().max(80, 'At most 80 characters').nullable(),
});
export type UpdateLotInput = z.input<typeof updateLotSchema>;

export const createLotEntrySchema = z
  .strictObject({
    kind: lotEntryKindSchema,
    jars: z.int('Whole jars').min(1, 'At least 1 jar').max(500),
    recipient: z.string().trim().min(1).max(80, 'At most 80 characters').optional(),
    date: calendarDateSchema,
    note: z.string().trim().max(500, 'At most 500 characters').optional(),
  })
  .refine((e) => e.kind !== 'gift' || e.recipient !== undefined, {
    message: 'Who were the jars given to?',
    path: ['recipient'],
  });
export type CreateLotEntryInput = z.input<typeof createLotEntrySchema>;

export interface LotEntryView {
  id: string;
  kind: LotEntryKind;
  jars: number;
  recipient: string | null;
  date: string;
  note: string | null;
  byName: string;
  createdAt: string;
}

export interface LotView {
  id: string;
  kitchenId: string;
  dayId: string;
  dayDate: string;
  batchId: string;
  code: string;
  recipeName: string;
  jarSize: JarSize;
  location: string | null;
  bestBy: string;
  flaggedAt: string | null;
  /** Jars that sealed (including reprocessed ones that sealed the second time). */
  sealed: number;
  eaten: number;
  given: number;
  spoiled: number;
  onShelf: number;
  entries: LotEntryView[];
}

/** `?dayId=`: only the lots of that canning day. */
export const lotsQuerySchema = z.strictObject({ dayId: idSchema.optional() });
export type LotsQuery = z.input<typeof lotsQuerySchema>;

/** Jars on the shelf across every lot of the kitchen, by jar size. */
export interface PantrySummaryView {
  bySize: { jarSize: JarSize; onShelf: number; lots: number }[];
  onShelf: number;
  lots: number;
  flaggedLots: number;
}

/** A caution as the server sends it, with the published source it rests on. */
export interface CautionView {
  id: string;
  title: string;
  text: string;
  source: string;
}

/** The answer to a new lot entry: the lot as it now stands, and the caution to show when the lot is flagged. */
export interface LotEntryAnswer {
  lot: LotView;
  entry: LotEntryView;
  caution: CautionView | null;
}

/* ---------- labels and the jar record ---------- */

export const LABEL_SHEETS = ['letter-rect-2x4', 'letter-round-2in', 'a4-rect-63x38'] as const;
export const labelSheetSchema = z.enum(LABEL_SHEETS, { error: `A label sheet is one of: ${LABEL_SHEETS.join(', ')}` });
export type LabelSheet = z.infer<typeof labelSheetSchema>;

export const labelsQuerySchema = z.strictObject({
  sheet: labelSheetSchema.default('letter-rect-2x4'),
});

/** What a label's QR code opens. Anyone with the code sees the jar; members of the kitchen also see the rest. */
export interface JarRecordView {
  code: string;
  jarNumber: number | null;
  product: string;
  dayDate: string;
  loadNumber: number | null;
  jarSize: JarSize;
  method: CanningMethod;
  processMinutes: number | null;
  altitude: { value: number; unit: 'ft' | 'm' };
  bestBy: string;
  seal: SealResult | null;
  /** A spoilage report on the lot: look at this jar carefully before opening it. */
  flagged: boolean;
  /** Only for members of the kitchen. */
  member: null | { kitchenId: string; kitchenName: string; lotId: string; dayId: string; loadId: string | null };
}

/* ---------- uploads ---------- */

export const ATTACHMENT_SUBJECTS = ['day', 'load', 'lot', 'recipe'] as const;
export const attachmentSubjectSchema = z.enum(ATTACHMENT_SUBJECTS, {
  error: `Attach to one of: ${ATTACHMENT_SUBJECTS.join(', ')}`,
});
export type AttachmentSubject = z.infer<typeof attachmentSubjectSchema>;

export const ATTACHMENT_MIME_TYPES = ['image/jpeg', 'image/png', 'image/webp', 'application/pdf'] as const;

export const attachmentTargetSchema = z.strictObject({
  subject: attachmentSubjectSchema,
  subjectId: idSchema,
});
export type AttachmentTarget = z.input<typeof attachmentTargetSchema>;

export interface AttachmentView {
  id: string;
  subject: AttachmentSubject;
  subjectId: string;
  fileName: string;
  mime: (typeof ATTACHMENT_MIME_TYPES)[number];
  bytes: number;
  width: number | null;
  height: number | null;
  hasThumb: boolean;
  /** Who added it (null once that account is gone): they and the leads may remove it. */
  uploadedById: string | null;
  uploadedByName: string | null;
  createdAt: string;
}

/* ---------- e-mail ---------- */

export const REMINDER_KINDS = ['bands-ready', 'reprocess-deadline'] as const;
export type ReminderKind = (typeof REMINDER_KINDS)[number];

export const updateMyMembershipSchema = z.strictObject({ reminders: z.boolean({ error: 'On or off' }) });
export type UpdateMyMembershipInput = z.input<typeof updateMyMembershipSchema>;

/** One message the development and demo mail catcher received (GET /api/dev/mail, newest first). */
export interface CaughtMailView {
  to: string[];
  subject: string;
  text: string;
  /** The http(s) addresses in the text, in order. */
  links: string[];
  at: string;
}

/** The signed-in person's own membership of a kitchen (GET and PATCH /api/kitchens/:kitchenId/members/me). */
export interface MyMembershipView {
  kitchenId: string;
  userId: string;
  role: Role;
  /** E-mail reminders about this kitchen's loads (bands may come off, a reprocess deadline nears). */
  reminders: boolean;
}
