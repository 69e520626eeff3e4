import type { DayView, KitchenView } from '@jarday/contracts';
import { useQuery } from '@tanstack/react-query';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { AttachmentsPanel } from '../../features/attachments';
import { cannersQueryOptions } from '../../features/canners/api/get-canners';
import { DayPlan } from '../../features/day/components/day-plan';
import { dayPaths } from '../../features/day/utils/day-paths';
import { recipesQueryOptions } from '../../features/recipes/api/get-recipes';
import { formatDate } from '../../lib/labels';
import { dayLoader, WithDay } from './day-live';

export const clientLoader = dayLoader;

function Plan({ kitchen, day }: { kitchen: KitchenView; day: DayView }) {
  const recipes = useQuery(recipesQueryOptions(kitchen.id));
  const canners = useQuery(cannersQueryOptions(kitchen.id));
  const where = `${kitchen.name} at ${day.altitude.value.toLocaleString('en-US')} ${day.altitude.unit}`;
  return (
    <>
      <PageHeader
        title={day.title}
        subtitle={`${formatDate(`${day.date}T12:00:00`)} · ${where}${day.status === 'closed' ? ' · closed' : ''}`}
        back={{ to: dayPaths.list(kitchen.id), label: 'Canning days' }}
      />
      <DayPlan
        kitchenId={kitchen.id}
        role={kitchen.role}
        day={day}
        recipes={recipes.data}
        canners={canners.data}
        links={{ recipes: paths.recipes(kitchen.id), settings: paths.settings(kitchen.id) }}
      />
      <AttachmentsPanel kitchenId={kitchen.id} role={kitchen.role} subject="day" subjectId={day.id} />
    </>
  );
}

/** /kitchens/:kitchenId/days/:dayId: the day's plan (batches, loads) and the way to its board. */
export default function DayRoute() {
  return <WithDay>{(kitchen, day) => <Plan kitchen={kitchen} day={day} />}</WithDay>;
}
