// An invented pantry lot, shaped by the contract types.
import type { LotEntryView, LotView } from '@jarday/contracts';
import { bestQualityDate } from '@jarday/rules';

export const KITCHEN_ID = '5f3c2b1a-7d6e-4c8b-9a0f-1e2d3c4b5a69';
export const LOT_ID = '8b2c3d4e-5f6a-4b7c-9d8e-0f1a2b3c4d5e';

export const lot = (over: Partial<LotView> = {}): LotView => ({
  id: LOT_ID,
  kitchenId: KITCHEN_ID,
  dayId: '6f1c2a4e-8d3b-4c5a-9e7f-1a2b3c4d5e6f',
  dayDate: '2025-09-06',
  batchId: '7a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d',
  code: '250906-A',
  recipeName: 'Hot-packed jam',
  jarSize: 'half-pint',
  location: 'Cellar shelf 2',
  bestBy: bestQualityDate('2025-09-06'),
  flaggedAt: null,
  sealed: 11,
  eaten: 0,
  given: 0,
  spoiled: 0,
  onShelf: 11,
  entries: [],
  ...over,
});

export const entry = (over: Partial<LotEntryView> = {}): LotEntryView => ({
  id: '1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f',
  kind: 'gift',
  jars: 2,
  recipient: 'The Alvarez family',
  date: '2025-09-12',
  note: null,
  byName: 'Ada Fenwick',
  createdAt: '2025-09-12T15:00:00.000Z',
  ...over,
});

export const entriesPath = `/api/kitchens/${KITCHEN_ID}/lots/${LOT_ID}/entries`;
