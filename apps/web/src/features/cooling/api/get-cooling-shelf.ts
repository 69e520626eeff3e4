import type { CoolingShelfView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { coolingKeys, kitchenPath } from './cooling-keys';

/** The shelf as the server sent it, with this device's clock offset from the server (server minus device). */
export interface CoolingShelf extends CoolingShelfView {
  offsetMs: number;
}

/** The shelf changes as people take bands off and check seals on other devices: look again every half minute. */
const REFRESH_MS = 30_000;

/**
 * GET /api/kitchens/:kitchenId/cooling[?dayId=] (any member). The offset is one sample of NTP's method (RFC 5905):
 * the server's time against the middle of the round trip, so a phone with a wrong clock still counts down right.
 */
export async function getCoolingShelf(kitchenId: string, dayId?: string): Promise<CoolingShelf> {
  const query = dayId ? `?dayId=${encodeURIComponent(dayId)}` : '';
  const sentAt = Date.now();
  const view = await api.get<CoolingShelfView>(`${kitchenPath(kitchenId)}/cooling${query}`);
  const receivedAt = Date.now();
  const serverAt = Date.parse(view.serverTime);
  return { ...view, offsetMs: Number.isNaN(serverAt) ? 0 : serverAt - (sentAt + receivedAt) / 2 };
}

export const coolingShelfQueryOptions = (kitchenId: string, dayId?: string) =>
  queryOptions({
    queryKey: coolingKeys.shelf(kitchenId, dayId),
    queryFn: () => getCoolingShelf(kitchenId, dayId),
    refetchInterval: REFRESH_MS,
    refetchOnWindowFocus: 'always',
  });

export const useCoolingShelf = (kitchenId: string, dayId?: string) =>
  useQuery(coolingShelfQueryOptions(kitchenId, dayId));
