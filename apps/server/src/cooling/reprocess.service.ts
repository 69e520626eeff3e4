import type { ReprocessAnswer, reprocessSchema } from '@jarday/contracts';
import { reprocessWindow } from '@jarday/rules';
import { Injectable } from '@nestjs/common';
import type { z } from 'zod';
import { CannersRepository } from '../canners/canners.repository.js';
import { AppError, notFound } from '../common/app-error.js';
import { DaysRepository } from '../days/days.repository.js';
import { type Actor, DaysService, toLoadView } from '../days/days.service.js';
import { TimersService } from '../timers/timers.service.js';
import { CoolingRepository } from './cooling.repository.js';
import { CoolingService, notLifted, reprocessClosed } from './cooling.service.js';

/**
 * Reprocessing: the unsealed jars of a load go back into a canner with new lids and the FULL process time, within
 * 24 hours of lifting (USDA Complete Guide to Home Canning, Guide 1, 1994). The new load is made exactly as any
 * load is (DaysService), so its plan and its process timer come from the rules, never from a device.
 */
@Injectable()
export class ReprocessService {
  constructor(
    private readonly cooling: CoolingRepository,
    private readonly coolingService: CoolingService,
    private readonly days: DaysRepository,
    private readonly daysService: DaysService,
    private readonly canners: CannersRepository,
    private readonly timers: TimersService,
  ) {}

  reprocess(
    kitchenId: string,
    loadId: string,
    input: z.output<typeof reprocessSchema>,
    actor: Actor,
    now = new Date(),
  ): ReprocessAnswer {
    const { load, day, batch } = this.coolingService.requireLoad(kitchenId, loadId);
    if (!load.liftedAt) throw notLifted(load);
    const carriedBy = this.cooling.reprocessingOf([load.id]).get(load.id);
    if (carriedBy) {
      throw new AppError(
        'nothing_to_reprocess',
        `Load ${load.number}'s unsealed jars already went back in as load ${carriedBy.number}`,
      );
    }
    if (!reprocessWindow(load.liftedAt, now).open) throw reprocessClosed(load, now);
    const jarNumbers = this.cooling
      .checksOf([load.id])
      .filter((c) => c.outcome === 'reprocess')
      .map((c) => c.jarNumber);
    if (jarNumbers.length === 0) {
      throw new AppError(
        'nothing_to_reprocess',
        `No jar of load ${load.number} is marked for reprocessing: check its seals and mark the unsealed jars first`,
      );
    }
    const canner = this.canners.find(kitchenId, input.cannerId);
    if (!canner) throw notFound('Canner');
    const plan = this.daysService.planLoad(day, batch, canner, jarNumbers.length);
    const { row, events, dayReopened } = this.days.transaction(() => {
      const reopened = this.daysService.reopenInTransaction(day, actor, now, {
        reason: 'reprocess',
        loadId: load.id,
        number: load.number,
      });
      const made = this.daysService.insertLoadInTransaction({
        day,
        batch,
        canner,
        jars: jarNumbers.length,
        plan,
        actor,
        now,
        reprocessOf: load,
      });
      const opened = this.daysService.record(day.id, actor, now, 'load.reprocess-opened', {
        loadId: load.id,
        number: load.number,
        newLoadId: made.row.id,
        newNumber: made.row.number,
        jarNumbers,
        minutes: plan.minutes,
        deadline: reprocessWindow(load.liftedAt!, now).deadline.toISOString(),
      });
      return { row: made.row, events: [...reopened, ...made.events, opened], dayReopened: reopened.length > 0 };
    });
    this.timers.publish(events);
    return {
      load: toLoadView(row),
      original: this.coolingService.loadView(kitchenId, load.id),
      jarNumbers,
      dayReopened,
    };
  }
}
