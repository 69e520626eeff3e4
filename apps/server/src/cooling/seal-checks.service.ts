import type { CoolingLoadView, sealCheckSchema } from '@jarday/contracts';
import { reprocessWindow } from '@jarday/rules';
import { Injectable } from '@nestjs/common';
import type { z } from 'zod';
import { AppError } from '../common/app-error.js';
import type { LoadRow } from '../days/days.repository.js';
import { type Actor, DaysService } from '../days/days.service.js';
import { PantryService } from '../pantry/pantry.service.js';
import { CoolingRepository, type SealCheckRow } from './cooling.repository.js';
import { CoolingService, notLifted, reprocessClosed } from './cooling.service.js';

/** Seal checks, jar by jar, once the bands are off; the first check of a batch makes its pantry lot. */
@Injectable()
export class SealChecksService {
  constructor(
    private readonly repo: CoolingRepository,
    private readonly cooling: CoolingService,
    private readonly daysService: DaysService,
    private readonly pantry: PantryService,
  ) {}

  /**
   * Seal results for some or all jars of a load, once its bands are off; a later check of a jar corrects the
   * earlier one. The batch's pantry lot is made in the same transaction as its first check.
   */
  check(
    kitchenId: string,
    loadId: string,
    input: z.output<typeof sealCheckSchema>,
    actor: Actor,
    now = new Date(),
  ): CoolingLoadView {
    const { load, day, batch } = this.cooling.requireLoad(kitchenId, loadId);
    if (!load.liftedAt) throw notLifted(load);
    if (!load.bandsOffAt) {
      throw new AppError(
        'bands_on',
        `Take the bands off load ${load.number} first: until then its jars stay undisturbed`,
      );
    }
    const outOfRange = input.jars.flatMap((j, i) =>
      j.jarNumber > load.jars
        ? [{ path: `jars.${i}.jarNumber`, message: `Load ${load.number} has jars 1 to ${load.jars}` }]
        : [],
    );
    if (outOfRange.length > 0) {
      throw new AppError(
        'validation_failed',
        `Load ${load.number} holds ${load.jars} jars, numbered 1 to ${load.jars}`,
        outOfRange,
      );
    }
    this.guardReprocessMarks(load, input, now);
    const rows: SealCheckRow[] = input.jars.map((j) => ({
      loadId: load.id,
      jarNumber: j.jarNumber,
      dayId: day.id,
      result: j.result,
      outcome: j.outcome,
      checkedAt: now,
      byUserId: actor.userId,
      byName: actor.name,
    }));
    this.cooling.publish(() => {
      this.repo.upsertChecks(rows);
      const { lot, created } = this.pantry.ensureLotInTransaction(day, batch, now);
      const all = this.repo.checksOf([load.id]);
      const count = (result: string) => input.jars.filter((j) => j.result === result).length;
      const events = [
        this.daysService.record(day.id, actor, now, 'load.seal-checked', {
          loadId: load.id,
          number: load.number,
          jars: input.jars,
          counts: { sealed: count('sealed'), unsealed: count('unsealed'), broken: count('broken') },
          load: { jars: load.jars, checked: all.length, sealed: all.filter((c) => c.result === 'sealed').length },
          lot: { id: lot.id, code: lot.code },
        }),
      ];
      if (created) {
        events.push(
          this.daysService.record(day.id, actor, now, 'lot.created', {
            lot: { id: lot.id, code: lot.code, batchId: batch.id, bestBy: lot.bestBy },
          }),
        );
      }
      return events;
    });
    return this.cooling.loadView(kitchenId, loadId);
  }

  /**
   * Once a load's unsealed jars went back into a canner, which jars those were is settled; and after 24 hours no
   * jar may be newly marked for reprocessing (it goes to the fridge).
   */
  private guardReprocessMarks(load: LoadRow, input: z.output<typeof sealCheckSchema>, now: Date): void {
    const before = new Map(this.repo.checksOf([load.id]).map((c) => [c.jarNumber, c]));
    const carriedBy = this.repo.reprocessingOf([load.id]).get(load.id);
    const open = reprocessWindow(load.liftedAt!, now).open;
    for (const jar of input.jars) {
      const was = before.get(jar.jarNumber)?.outcome === 'reprocess';
      const is = jar.outcome === 'reprocess';
      if (carriedBy && was !== is) {
        throw new AppError(
          'conflict',
          was
            ? `Jar ${jar.jarNumber} went back into the canner as load ${carriedBy.number}: record its seal there`
            : `Load ${load.number}'s unsealed jars already went back in as load ${carriedBy.number}: put jar ` +
                `${jar.jarNumber} in the fridge and eat it within a few days`,
        );
      }
      if (is && !was && !open) throw reprocessClosed(load, now);
    }
  }
}
