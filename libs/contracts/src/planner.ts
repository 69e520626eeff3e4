import type {
  Altitude,
  CanningMethod,
  ComeUpSource,
  JarSize,
  MassAmount,
  PackStyle,
  PlannedStep,
  ProcessPlan,
} from '@jarday/rules';
import { z } from 'zod';
import { createBatchSchema, createDaySchema } from './days.js';
import { idSchema } from './kitchens.js';

/** What to plan: batches of the kitchen's recipes, one canner or two of its canners, and when the day starts. */
export const planRequestSchema = z.strictObject({
  batches: z.array(createBatchSchema).min(1, 'Choose at least one recipe').max(20, 'At most 20 batches'),
  cannerIds: z
    .array(idSchema)
    .min(1, 'Choose a canner')
    .max(2, 'One canner or two')
    .refine((ids) => new Set(ids).size === ids.length, { message: 'Choose each canner once' }),
  /** When the kitchen starts work, an ISO date-time with its offset. */
  startAt: z.iso.datetime({ offset: true, error: 'Give the start as a date and time, e.g. 2026-08-15T08:00:00Z' }),
});
export type PlanRequest = z.input<typeof planRequestSchema>;

/** Starting the plan also creates the day: its date and name as on "Start a canning day". */
export const startPlanSchema = planRequestSchema.extend(createDaySchema.shape);
export type StartPlanInput = z.input<typeof startPlanSchema>;

export interface ComeUpView {
  minutes: number;
  source: ComeUpSource;
  /** e.g. "learned from 5 logged loads: median 24 min". */
  detail: string;
  samples: number;
  range: { min: number; max: number } | null;
}

export interface PlannerCannerView {
  id: string;
  name: string;
  method: CanningMethod;
  comeUp: ComeUpView;
}

export type PlanStepView = Omit<PlannedStep, 'startAt' | 'endAt'> & { startAt: string; endAt: string };

export interface PlanLoadView {
  number: number;
  batchIndex: number;
  cannerId: string;
  cannerName: string;
  method: CanningMethod;
  jars: number;
  plan: ProcessPlan;
  fillAt: string;
  lidOnAt: string;
  processStartAt: string;
  processEndAt: string;
  liftAt: string;
  bandsOff: { earliestAt: string; recommendedAt: string };
}

export interface PlanBatchView {
  index: number;
  recipeId: string;
  recipeName: string;
  tested: boolean;
  jarSize: JarSize;
  pack: PackStyle;
  jars: number;
  partialJar: number;
  leftoverProduce: MassAmount | null;
}

export interface DayPlanView {
  altitude: Altitude;
  startAt: string;
  canners: PlannerCannerView[];
  jarsBySize: { jarSize: JarSize; jars: number }[];
  batches: PlanBatchView[];
  loads: PlanLoadView[];
  steps: PlanStepView[];
  heatingStartAt: string;
  endAt: string;
  bandsOff: { earliestAt: string; recommendedAt: string };
}

export interface PlanRefusalView {
  code: string;
  message: string;
  batchIndex: number | null;
}

/** A preview either plans or says, per batch, why not (a refusal is an answer, not an error). */
export type PlanPreviewAnswer =
  { ok: true; plan: DayPlanView } | { ok: false; reasons: PlanRefusalView[]; canners: PlannerCannerView[] };
