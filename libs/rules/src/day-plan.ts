import { z } from 'zod';
import { bandRemovalTimes } from './after-canner.js';
import { dayTimeline, type LoadSlot, type PlannedStep, TIMELINE_DEFAULTS } from './day-plan-timeline.js';
import { jarSizeSchema, type JarSize } from './jars.js';
import { altitudeSchema, canningMethodSchema, gaugeTypeSchema, type CanningMethod } from './kitchen.js';
import { planProcess, type PlanRefusalCode, type ProcessPlan } from './plan.js';
import { packStyleSchema, type PackStyle } from './process-table.js';
import { recipeRulesSchema } from './recipe.js';
import { massAmountSchema, type MassAmount } from './units.js';
import { jarsFromProduce } from './yields.js';

export type { PlannedStep, StepKind } from './day-plan-timeline.js';
export { TIMELINE_DEFAULTS } from './day-plan-timeline.js';

/** A recipe's preparation step as the planner reads it (the Recipe box stores more). */
export const planPrepStepSchema = z.object({
  kind: z.string().min(1).max(40),
  label: z.string().min(1).max(200),
  seconds: z
    .number()
    .int()
    .positive()
    .max(24 * 3600)
    .nullable()
    .default(null),
});

export const planBatchSchema = z
  .object({
    recipe: recipeRulesSchema.loose(),
    prepSteps: z.array(planPrepStepSchema).max(30).default([]),
    jarSize: jarSizeSchema,
    pack: packStyleSchema,
    jars: z.number().int('Whole jars').min(1, 'At least 1 jar').max(500, 'At most 500 jars').optional(),
    produce: massAmountSchema.optional(),
  })
  .refine((b) => (b.jars === undefined) !== (b.produce === undefined), {
    message: 'Give either the number of jars or the produce weight',
    path: ['jars'],
  });

export const planCannerSchema = z.object({
  id: z.string().min(1).max(64),
  name: z.string().min(1).max(80).default('Canner'),
  method: canningMethodSchema,
  gauge: gaugeTypeSchema.nullable(),
  capacity: z.partialRecord(jarSizeSchema, z.number().int().nonnegative()),
  /** Lid on to rolling boil, from estimateComeUp. */
  comeUpMs: z
    .number()
    .positive()
    .max(6 * 3600_000),
});

export const dayPlanInputSchema = z.object({
  batches: z.array(planBatchSchema).min(1, 'Choose at least one recipe').max(20, 'At most 20 batches'),
  canners: z.array(planCannerSchema).min(1, 'Choose a canner').max(2, 'One canner or two'),
  altitude: altitudeSchema,
  startAt: z.date({ error: 'startAt must be a date and time' }),
  /** Minutes allowed for each untimed prep step (peeling, chopping) and for filling one load. Assumptions. */
  untimedStepMinutes: z.number().int().min(1).max(240).default(TIMELINE_DEFAULTS.untimedStepMinutes),
  fillMinutes: z.number().int().min(1).max(120).default(TIMELINE_DEFAULTS.fillMinutes),
});
export type DayPlanInput = z.input<typeof dayPlanInputSchema>;

export interface PlannedBatch {
  index: number;
  recipeName: string;
  jarSize: JarSize;
  pack: PackStyle;
  jars: number;
  /** From produce: how full the last jar would be (0 when it comes out even), and what is left over. */
  partialJar: number;
  leftoverProduce: MassAmount | null;
}

export interface PlannedLoad {
  /** 1, 2, 3... in the order the loads go into the canners. */
  number: number;
  batchIndex: number;
  cannerId: string;
  cannerName: string;
  method: CanningMethod;
  jars: number;
  /** The tested process for this load at the altitude (planProcess). */
  plan: ProcessPlan;
  fillAt: Date;
  lidOnAt: Date;
  /** Rolling boil (boiling water) or at pressure (pressure canning): the process clock starts. */
  processStartAt: Date;
  processEndAt: Date;
  liftAt: Date;
  bandsOff: { earliestAt: Date; recommendedAt: Date };
}

export interface DayPlan {
  jarsBySize: { jarSize: JarSize; jars: number }[];
  batches: PlannedBatch[];
  loads: PlannedLoad[];
  steps: PlannedStep[];
  /** The first canner's water goes on. */
  heatingStartAt: Date;
  /** The last load is lifted. */
  endAt: Date;
  /** Every load's bands may come off from here (12 h after the last lift); 24 h is recommended. */
  bandsOff: { earliestAt: Date; recommendedAt: Date };
}

export interface DayPlanRefusal {
  code: PlanRefusalCode | 'no-yield' | 'no-canner';
  message: string;
  /** The batch the refusal is about, when it is about one. */
  batchIndex: number | null;
}

export type DayPlanResult = { ok: true; plan: DayPlan } | { ok: false; reasons: DayPlanRefusal[] };

type Batch = z.output<typeof planBatchSchema>;
type Canner = z.output<typeof planCannerSchema>;

/** The batch's jars: given, or counted from the produce by the recipe's published yield (jars to prepare). */
function batchJars(b: Batch, index: number): PlannedBatch | DayPlanRefusal {
  const base = { index, recipeName: b.recipe.name, jarSize: b.jarSize, pack: b.pack };
  if (b.jars !== undefined) return { ...base, jars: b.jars, partialJar: 0, leftoverProduce: null };
  const count = jarsFromProduce(b.recipe, b.jarSize, b.produce as MassAmount);
  if (!count.ok) return { code: count.reason.code, message: count.reason.message, batchIndex: index };
  const { jarsToPrepare, partialJar, leftoverProduce } = count.count;
  return { ...base, jars: jarsToPrepare, partialJar, leftoverProduce };
}

/**
 * Plan a canning day: jars by size, canner loads (each canner filled to its capacity for the jar size, loads going
 * to whichever suitable canner is free first), each load's tested process at the altitude (planProcess), and a
 * timeline from `startAt`. Refuses, naming the batch, a recipe no chosen canner can process.
 */
export function planDay(input: DayPlanInput): DayPlanResult {
  const parsed = dayPlanInputSchema.safeParse(input);
  if (!parsed.success) {
    const reasons = parsed.error.issues.map((i) => ({
      code: 'invalid-input' as const,
      message: (i.path.length ? `${i.path.join('.')}: ` : '') + i.message,
      batchIndex: typeof i.path[1] === 'number' && i.path[0] === 'batches' ? i.path[1] : null,
    }));
    return { ok: false, reasons };
  }
  const v = parsed.data;
  const reasons: DayPlanRefusal[] = [];
  const batches: PlannedBatch[] = [];
  const fits: { canner: Canner; plan: ProcessPlan }[][] = [];
  v.batches.forEach((b, index) => {
    const counted = batchJars(b, index);
    if ('code' in counted) return void reasons.push(counted);
    const tried = v.canners.map((canner) => ({
      canner,
      result: planProcess({ recipe: b.recipe, jarSize: b.jarSize, pack: b.pack, altitude: v.altitude, canner }),
    }));
    const ok = tried.flatMap((t) => (t.result.ok ? [{ canner: t.canner, plan: t.result.plan }] : []));
    const first = tried.find((t) => !t.result.ok)?.result;
    if (ok.length === 0 && first && !first.ok) reasons.push({ ...first.reason, batchIndex: index });
    batches.push(counted);
    fits.push(ok);
  });
  if (reasons.length > 0) return { ok: false, reasons };

  const timeline = dayTimeline({
    startAt: v.startAt.getTime(),
    batches: v.batches.map((b, i) => ({
      recipeName: b.recipe.name,
      prepSteps: b.prepSteps,
      jars: batches[i]?.jars ?? 0,
    })),
    fits: fits.map((list) => list.map((f) => ({ cannerId: f.canner.id, plan: f.plan }))),
    canners: v.canners.map((c) => ({ id: c.id, name: c.name, comeUpMs: c.comeUpMs })),
    untimedStepMs: v.untimedStepMinutes * 60_000,
    fillMs: v.fillMinutes * 60_000,
  });
  const loads = timeline.loads.map((slot: LoadSlot, i): PlannedLoad => {
    const canner = v.canners.find((c) => c.id === slot.cannerId) as Canner;
    return {
      number: i + 1,
      batchIndex: slot.batchIndex,
      cannerId: canner.id,
      cannerName: canner.name,
      method: canner.method,
      jars: slot.jars,
      plan: slot.plan,
      fillAt: new Date(slot.fillAt),
      lidOnAt: new Date(slot.lidOnAt),
      processStartAt: new Date(slot.processStartAt),
      processEndAt: new Date(slot.processEndAt),
      liftAt: new Date(slot.liftAt),
      bandsOff: bandRemovalTimes(new Date(slot.liftAt)),
    };
  });
  const jarsBySize = new Map<JarSize, number>();
  for (const b of batches) jarsBySize.set(b.jarSize, (jarsBySize.get(b.jarSize) ?? 0) + b.jars);
  const endAt = new Date(Math.max(...timeline.loads.map((l) => l.liftAt)));
  return {
    ok: true,
    plan: {
      jarsBySize: [...jarsBySize].map(([jarSize, jars]) => ({ jarSize, jars })),
      batches,
      loads,
      steps: timeline.steps,
      heatingStartAt: new Date(timeline.heatingStartAt),
      endAt,
      bandsOff: bandRemovalTimes(endAt),
    },
  };
}
