import type { JarRecordView, LabelSheet } from '@jarday/contracts';
import { Injectable } from '@nestjs/common';
import { AppError, notFound } from '../common/app-error.js';
import { KitchensRepository } from '../kitchens/kitchens.repository.js';
import { type JarLabel, renderLabels } from './label-pdf.js';
import { SHEETS } from './label-sheets.js';
import { LabelsRepository } from './labels.repository.js';

const TOKEN = /^[A-Za-z0-9_-]{16,64}$/;
const JAR_REF = /^(.+)-(\d{1,3})-(\d{1,3})$/;

/**
 * `<token>-<load>-<jar>` names one jar; the token alone names the lot. A token may itself contain dashes and
 * digits, so the jar reading is tried first and the whole reference as a token second.
 */
interface RefReading {
  token: string;
  loadNumber: number | null;
  jarNumber: number | null;
}

function readRef(ref: string): RefReading[] {
  const m = JAR_REF.exec(ref);
  const readings: RefReading[] = m ? [{ token: m[1]!, loadNumber: Number(m[2]), jarNumber: Number(m[3]) }] : [];
  readings.push({ token: ref, loadNumber: null, jarNumber: null });
  return readings.filter((r) => TOKEN.test(r.token));
}

/** The address a label's QR code opens. */
export const recordRef = (token: string, loadNumber: number, jarNumber: number) =>
  `${token}-${loadNumber}-${jarNumber}`;

@Injectable()
export class LabelsService {
  constructor(
    private readonly repo: LabelsRepository,
    private readonly kitchens: KitchensRepository,
  ) {}

  /** Labels for every jar of the lot whose seal check says sealed, in load and jar order. */
  async labelsPdf(kitchenId: string, lotId: string, sheet: LabelSheet, origin: string): Promise<Buffer> {
    const found = this.repo.lotInKitchen(kitchenId, lotId);
    if (!found) throw notFound('Lot');
    const { lot, day, batch } = found;
    const loads = this.repo.loadsOfBatch(batch.id);
    const numberOf = new Map(loads.map((l) => [l.id, l.number]));
    const labels: JarLabel[] = this.repo
      .checksOf(loads.map((l) => l.id))
      .filter((c) => c.result === 'sealed')
      .map((c) => ({ loadNumber: numberOf.get(c.loadId)!, jarNumber: c.jarNumber }))
      .sort((a, b) => a.loadNumber - b.loadNumber || a.jarNumber - b.jarNumber)
      .map((j) => ({
        product: batch.recipe.name,
        cannedOn: day.date,
        lotCode: lot.code,
        bestBy: lot.bestBy,
        ...j,
        url: `${origin}/r/${recordRef(lot.publicToken, j.loadNumber, j.jarNumber)}`,
      }));
    if (labels.length === 0) {
      throw new AppError('conflict', `Lot ${lot.code} has no sealed jars yet: check the seals first`);
    }
    return renderLabels(SHEETS[sheet], labels);
  }

  /**
   * What anyone holding the jar may read: the product, the canning and the seal, and whether the lot was flagged.
   * Nothing that names the kitchen or its people, unless the reader is a member.
   */
  record(ref: string, viewerId: string | undefined): JarRecordView {
    let reading: RefReading | undefined;
    let found: ReturnType<LabelsRepository['lotByToken']>;
    for (const r of readRef(ref)) {
      found = this.repo.lotByToken(r.token);
      if (found) {
        reading = r;
        break;
      }
    }
    if (!found || !reading) throw notFound('Jar record');
    const { lot, day, batch, kitchenName } = found;
    const { loadNumber, jarNumber } = reading;
    const loads = this.repo.loadsOfBatch(batch.id);
    // For the lot as a whole, the first load that was not a reprocessing gives the method and the time.
    const load =
      loadNumber === null
        ? (loads.find((l) => l.reprocessOf === null) ?? loads[0])
        : loads.find((l) => l.number === loadNumber);
    if (!load || (jarNumber !== null && (jarNumber < 1 || jarNumber > load.jars))) throw notFound('Jar record');
    const check = jarNumber === null ? undefined : this.repo.checksOf([load.id]).find((c) => c.jarNumber === jarNumber);
    const member = viewerId ? this.kitchens.findMembership(lot.kitchenId, viewerId) : undefined;
    return {
      code: lot.code,
      jarNumber,
      product: batch.recipe.name,
      dayDate: day.date,
      loadNumber,
      jarSize: batch.jarSize,
      method: load.method,
      processMinutes: load.plan.minutes,
      altitude: { value: day.altitudeValue, unit: day.altitudeUnit },
      bestBy: lot.bestBy,
      seal: check?.result ?? null,
      flagged: lot.flaggedAt !== null,
      member: member
        ? {
            kitchenId: lot.kitchenId,
            kitchenName,
            lotId: lot.id,
            dayId: day.id,
            loadId: loadNumber === null ? null : load.id,
          }
        : null,
    };
  }
}
