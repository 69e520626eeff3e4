import {
  jarSizeSchema,
  massAmountSchema,
  packStyleSchema,
  type Altitude,
  type CanningMethod,
  type JarSize,
  type PackStyle,
  type ProcessPlan,
} from '@jarday/rules';
import { z } from 'zod';
import { idSchema } from './kitchens.js';

export const DAY_STATUSES = ['open', 'closed'] as const;
export type DayStatus = (typeof DAY_STATUSES)[number];

export const createDaySchema = z.strictObject({
  /** The calendar date in the kitchen. */
  date: z.iso.date({ error: 'Give the date as YYYY-MM-DD' }),
  title: z.string().trim().min(1, 'Give the day a name').max(80, 'At most 80 characters').default('Canning day'),
});
export type CreateDayInput = z.input<typeof createDaySchema>;

export const listDaysQuerySchema = z.strictObject({
  status: z.enum(DAY_STATUSES).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});

/** A batch is a recipe at a scale: a number of jars, or the produce on hand (the recipe's own yield counts the jars). */
export const createBatchSchema = z
  .strictObject({
    recipeId: z.string({ error: 'Choose a recipe' }).min(1, 'Choose a recipe').max(64),
    jarSize: jarSizeSchema,
    pack: packStyleSchema,
    jars: z.number().int('Whole jars').min(1, 'At least 1 jar').max(500, 'At most 500 jars').optional(),
    produce: massAmountSchema.optional(),
  })
  .refine((b) => (b.jars === undefined) !== (b.produce === undefined), {
    message: 'Give either the number of jars or the produce weight',
    path: ['jars'],
  });
export type CreateBatchInput = z.input<typeof createBatchSchema>;

export const createLoadSchema = z.strictObject({
  batchId: idSchema,
  cannerId: idSchema,
  jars: z
    .number({ error: 'How many jars go in?' })
    .int('Whole jars')
    .min(1, 'At least 1 jar')
    .max(60, 'At most 60 jars'),
});
export type CreateLoadInput = z.input<typeof createLoadSchema>;

export interface BatchView {
  id: string;
  dayId: string;
  recipeId: string;
  recipeName: string;
  tested: boolean;
  jarSize: JarSize;
  pack: PackStyle;
  jars: number;
  createdAt: string;
}

export interface LoadView {
  id: string;
  dayId: string;
  batchId: string;
  /** 1, 2, 3... within the day. */
  number: number;
  cannerId: string | null;
  cannerName: string;
  method: CanningMethod;
  jars: number;
  /** The process plan at the day's altitude, as the rules gave it when the load was made. */
  plan: ProcessPlan;
  liftedAt: string | null;
  createdAt: string;
}

export interface DaySummaryView {
  id: string;
  kitchenId: string;
  date: string;
  title: string;
  status: DayStatus;
  altitude: Altitude;
  createdAt: string;
  closedAt: string | null;
  batchCount: number;
  loadCount: number;
}

export interface DayView extends DaySummaryView {
  batches: BatchView[];
  loads: LoadView[];
  /** The last journal number: a device that has it has seen everything. */
  seq: number;
}
