import type { DayView, KitchenView } from '@jarday/contracts';
import { PocketView } from '../../features/day/components/pocket-view';
import { dayPaths } from '../../features/day/utils/day-paths';
import { dayLoader, sessionLiveAuth, useDocumentTitle, WithDay } from './day-live';

export const clientLoader = dayLoader;

function Pocket({ kitchen, day }: { kitchen: KitchenView; day: DayView }) {
  useDocumentTitle(`${day.title} · Jarday`);
  return (
    <PocketView
      kitchen={kitchen}
      day={day}
      auth={sessionLiveAuth}
      links={{ plan: dayPaths.plan(kitchen.id, day.id), pocket: dayPaths.pocket(kitchen.id, day.id) }}
    />
  );
}

/** /kitchens/:kitchenId/days/:dayId/pocket: the same day on a helper's phone. */
export default function PocketRoute() {
  return <WithDay>{(kitchen, day) => <Pocket kitchen={kitchen} day={day} />}</WithDay>;
}
