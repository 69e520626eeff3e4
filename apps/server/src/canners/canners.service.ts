import { randomUUID } from 'node:crypto';
import type { CannerView, createCannerSchema } from '@jarday/contracts';
import { Injectable } from '@nestjs/common';
import type { z } from 'zod';
import { notFound } from '../common/app-error.js';
import { type CannerRow, CannersRepository } from './canners.repository.js';

export type CannerInput = z.output<typeof createCannerSchema>;

const toView = (c: CannerRow): CannerView => ({
  id: c.id,
  kitchenId: c.kitchenId,
  name: c.name,
  method: c.method,
  gauge: c.gauge,
  capacity: c.capacity,
  waterLitres: c.waterLitres,
  burnerWatts: c.burnerWatts,
  createdAt: c.createdAt.toISOString(),
});

@Injectable()
export class CannersService {
  constructor(private readonly repo: CannersRepository) {}

  list(kitchenId: string): CannerView[] {
    return this.repo.list(kitchenId).map(toView);
  }

  create(kitchenId: string, input: CannerInput, now = new Date()): CannerView {
    const row: CannerRow = {
      id: randomUUID(),
      kitchenId,
      createdAt: now,
      ...input,
    };
    this.repo.insert(row);
    return toView(row);
  }

  replace(kitchenId: string, id: string, input: CannerInput): CannerView {
    if (!this.repo.update(kitchenId, id, input)) throw notFound('Canner');
    const row = this.repo.find(kitchenId, id);
    if (!row) throw notFound('Canner');
    return toView(row);
  }

  remove(kitchenId: string, id: string): void {
    if (!this.repo.delete(kitchenId, id)) throw notFound('Canner');
  }
}
