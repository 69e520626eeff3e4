import type { DayView, KitchenView } from '@jarday/contracts';
import { useQuery } from '@tanstack/react-query';
import { CounterBoard } from '../../features/day/components/counter-board';
import { dayPaths } from '../../features/day/utils/day-paths';
import { recipesQueryOptions } from '../../features/recipes/api/get-recipes';
import { dayLoader, sessionLiveAuth, useDocumentTitle, WithDay } from './day-live';

export const clientLoader = dayLoader;

function Board({ kitchen, day }: { kitchen: KitchenView; day: DayView }) {
  // The recipes only add their prep steps to the guide: the board works while they load, or without them.
  const recipes = useQuery(recipesQueryOptions(kitchen.id));
  useDocumentTitle(`${day.title} · Counter board · Jarday`);
  return (
    <CounterBoard
      kitchen={kitchen}
      day={day}
      recipes={recipes.data}
      auth={sessionLiveAuth}
      links={{ plan: dayPaths.plan(kitchen.id, day.id), pocket: dayPaths.pocket(kitchen.id, day.id) }}
    />
  );
}

/** /kitchens/:kitchenId/days/:dayId/board: the Counter board on the kitchen tablet. */
export default function BoardRoute() {
  return <WithDay>{(kitchen, day) => <Board kitchen={kitchen} day={day} />}</WithDay>;
}
