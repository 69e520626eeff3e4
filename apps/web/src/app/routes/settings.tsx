import type { KitchenView } from '@jarday/contracts';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { cannersQueryOptions } from '../../features/canners/api/get-canners';
import { CannerList } from '../../features/canners/components/canner-list';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { AltitudeCaution } from '../../features/kitchens/components/altitude-caution';
import { KitchenSettingsForm } from '../../features/kitchens/components/kitchen-settings-form';
import { KitchenSummary } from '../../features/kitchens/components/kitchen-summary';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const kitchenId = params.kitchenId ?? '';
    return ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(kitchenId)),
        queryClient.ensureQueryData(cannersQueryOptions(kitchenId)),
      ]),
    );
  };

function SettingsPage({ kitchen }: { kitchen: KitchenView }) {
  const lead = kitchen.role === 'lead';
  return (
    <>
      <PageHeader
        title="Settings & canners"
        subtitle={kitchen.name}
        back={{ to: paths.kitchen(kitchen.id), label: kitchen.name }}
      />
      <Stack spacing={5}>
        <Stack component="section" spacing={2} aria-labelledby="kitchen-settings-heading">
          <Typography id="kitchen-settings-heading" variant="h2">
            Kitchen
          </Typography>
          <AltitudeCaution />
          <Card>
            <CardContent sx={{ p: { xs: 2, sm: 3 } }}>
              {lead ? (
                <KitchenSettingsForm key={kitchen.id} kitchen={kitchen} />
              ) : (
                <Stack spacing={2}>
                  <KitchenSummary kitchen={kitchen} />
                  <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                    Only a lead can change these settings.
                  </Typography>
                </Stack>
              )}
            </CardContent>
          </Card>
        </Stack>
        <Stack component="section" spacing={2} aria-labelledby="canners-heading">
          <Typography id="canners-heading" variant="h2">
            Canners
          </Typography>
          <Card>
            <CardContent sx={{ p: { xs: 2, sm: 3 } }}>
              <CannerList kitchenId={kitchen.id} canManage={lead} />
            </CardContent>
          </Card>
        </Stack>
      </Stack>
    </>
  );
}

export default function SettingsRoute() {
  return <WithKitchen>{(kitchen) => <SettingsPage kitchen={kitchen} />}</WithKitchen>;
}
