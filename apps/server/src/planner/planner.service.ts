import {
  type DayPlanView,
  type DayView,
  type PlannerCannerView,
  type PlanPreviewAnswer,
  type planRequestSchema,
  rulesOf,
  type startPlanSchema,
} from '@jarday/contracts';
import { type DayPlan, estimateComeUp, planDay } from '@jarday/rules';
import { Injectable } from '@nestjs/common';
import type { z } from 'zod';
import { CannersRepository } from '../canners/canners.repository.js';
import { AppError, notFound } from '../common/app-error.js';
import { type Actor, DaysService } from '../days/days.service.js';
import { KitchensRepository } from '../kitchens/kitchens.repository.js';
import { RecipesService } from '../recipes/recipes.service.js';
import { PlannerRepository } from './planner.repository.js';

type PlanRequest = z.output<typeof planRequestSchema>;
type StartPlan = z.output<typeof startPlanSchema>;

const iso = (d: Date) => d.toISOString();
const isoPair = (p: { earliestAt: Date; recommendedAt: Date }) => ({
  earliestAt: iso(p.earliestAt),
  recommendedAt: iso(p.recommendedAt),
});

/** The rules' plan with its times as ISO strings, and each batch's recipe named. */
function toView(
  plan: DayPlan,
  req: PlanRequest,
  ctx: Omit<DayPlanView, 'batches' | 'loads' | 'steps' | 'jarsBySize' | 'heatingStartAt' | 'endAt' | 'bandsOff'>,
  tested: boolean[],
): DayPlanView {
  return {
    ...ctx,
    jarsBySize: plan.jarsBySize,
    batches: plan.batches.map((b) => ({
      ...b,
      recipeId: req.batches[b.index]?.recipeId ?? '',
      tested: tested[b.index] ?? false,
    })),
    loads: plan.loads.map((l) => ({
      ...l,
      fillAt: iso(l.fillAt),
      lidOnAt: iso(l.lidOnAt),
      processStartAt: iso(l.processStartAt),
      processEndAt: iso(l.processEndAt),
      liftAt: iso(l.liftAt),
      bandsOff: isoPair(l.bandsOff),
    })),
    steps: plan.steps.map((s) => ({ ...s, startAt: iso(s.startAt), endAt: iso(s.endAt) })),
    heatingStartAt: iso(plan.heatingStartAt),
    endAt: iso(plan.endAt),
    bandsOff: isoPair(plan.bandsOff),
  };
}

@Injectable()
export class PlannerService {
  constructor(
    private readonly repo: PlannerRepository,
    private readonly kitchens: KitchensRepository,
    private readonly canners: CannersRepository,
    private readonly recipes: RecipesService,
    private readonly days: DaysService,
  ) {}

  /**
   * A plan for the kitchen's altitude, with each canner's come-up: learned from its logged loads, else estimated
   * from its water and burner, else the published range. A plan the rules refuse comes back with the reasons.
   */
  preview(kitchenId: string, req: PlanRequest): PlanPreviewAnswer {
    const kitchen = this.kitchens.findKitchen(kitchenId);
    if (!kitchen) throw notFound('Kitchen');
    const altitude = { value: kitchen.altitudeValue, unit: kitchen.altitudeUnit };
    const rows = req.cannerIds.map(
      (id) =>
        this.canners.find(kitchenId, id) ??
        (() => {
          throw notFound('Canner');
        })(),
    );
    const history = this.repo.comeUpHistory(kitchenId, req.cannerIds);
    const comeUps = rows.map((c) =>
      estimateComeUp({
        history: history.get(c.id) ?? [],
        waterLitres: c.waterLitres,
        burnerWatts: c.burnerWatts,
        altitude,
      }),
    );
    const canners: PlannerCannerView[] = rows.map((c, i) => {
      const { ms: _ms, ...comeUp } = comeUps[i] ?? estimateComeUp({ altitude });
      return { id: c.id, name: c.name, method: c.method, comeUp };
    });
    const recipes = req.batches.map((b) => this.recipes.get(kitchenId, b.recipeId));
    const result = planDay({
      batches: req.batches.map((b, i) => {
        const recipe = recipes[i] ?? this.recipes.get(kitchenId, b.recipeId);
        return {
          recipe: rulesOf(recipe),
          prepSteps: recipe.prepSteps,
          jarSize: b.jarSize,
          pack: b.pack,
          jars: b.jars,
          produce: b.produce,
        };
      }),
      canners: rows.map((c, i) => ({
        id: c.id,
        name: c.name,
        method: c.method,
        gauge: c.gauge,
        capacity: c.capacity,
        comeUpMs: comeUps[i]?.ms ?? 0,
      })),
      altitude,
      startAt: new Date(req.startAt),
    });
    if (!result.ok) return { ok: false, reasons: result.reasons, canners };
    const tested = recipes.map((r) => r.tested);
    return {
      ok: true,
      plan: toView(result.plan, req, { altitude, startAt: new Date(req.startAt).toISOString(), canners }, tested),
    };
  }

  /**
   * Opens the day the plan describes, through the days service: the day, each batch, then each load in the plan's
   * order (each load's process timer comes from the rules there, as for any load). The whole plan is checked first,
   * so a refused plan creates nothing.
   */
  start(kitchenId: string, input: StartPlan, actor: Actor): DayView {
    const { date, title, ...req } = input;
    const answer = this.preview(kitchenId, req);
    if (!answer.ok) throw new AppError('plan_refused', answer.reasons.map((r) => r.message).join(' '));
    const day = this.days.create(kitchenId, { date, title }, actor);
    const batchIds = answer.plan.batches.map(
      (b) =>
        this.days.addBatch(
          kitchenId,
          day.id,
          { recipeId: b.recipeId, jarSize: b.jarSize, pack: b.pack, jars: b.jars },
          actor,
        ).id,
    );
    for (const load of answer.plan.loads) {
      const batchId = batchIds[load.batchIndex];
      if (batchId === undefined) throw new Error(`Unreachable: no batch ${load.batchIndex}`);
      this.days.addLoad(kitchenId, day.id, { batchId, cannerId: load.cannerId, jars: load.jars }, actor);
    }
    return this.days.get(kitchenId, day.id);
  }
}
