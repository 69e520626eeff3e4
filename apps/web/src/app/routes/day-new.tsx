import Alert from '@mui/material/Alert';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { StartDayForm } from '../../features/day/components/start-day-form';
import { dayPaths } from '../../features/day/utils/day-paths';
import { WithKitchen } from './with-kitchen';

/** /kitchens/:kitchenId/days/new: a lead starts a canning day, then plans its batches and loads. */
export default function DayNewRoute() {
  const navigate = useNavigate();
  return (
    <WithKitchen>
      {(kitchen) => (
        <>
          <PageHeader
            title="Start a canning day"
            subtitle={kitchen.name}
            back={{ to: dayPaths.list(kitchen.id), label: 'Canning days' }}
          />
          {kitchen.role === 'lead' ? (
            <StartDayForm
              kitchenId={kitchen.id}
              onCreated={(day) => void navigate(dayPaths.plan(kitchen.id, day.id))}
            />
          ) : (
            <Alert severity="info">Only the kitchen’s lead starts a canning day.</Alert>
          )}
        </>
      )}
    </WithKitchen>
  );
}
