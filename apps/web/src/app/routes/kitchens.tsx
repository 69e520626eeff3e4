import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { Loading, QueryError } from '../../components/ui/query-state';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { kitchensQueryOptions, useKitchens } from '../../features/kitchens/api/get-kitchens';
import { CreateKitchenForm } from '../../features/kitchens/components/create-kitchen-form';
import { KitchenList } from '../../features/kitchens/components/kitchen-list';
import { ensureQuietly } from './with-kitchen';

export const clientLoader = (queryClient: QueryClient) => () =>
  ensureQuietly(queryClient.ensureQueryData(kitchensQueryOptions()));

export default function KitchensRoute() {
  const kitchens = useKitchens();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="My kitchens" subtitle="Pick a kitchen, or start a new one." />
      <Stack spacing={5}>
        <Stack component="section" spacing={2} aria-labelledby="my-kitchens">
          <Typography id="my-kitchens" variant="h2">
            Kitchens I am in
          </Typography>
          {kitchens.isPending ? <Loading label="Loading kitchens" /> : null}
          {kitchens.isError ? <QueryError error={kitchens.error} onRetry={() => void kitchens.refetch()} /> : null}
          {kitchens.data ? <KitchenList kitchens={kitchens.data} /> : null}
        </Stack>
        <Stack component="section" spacing={2} aria-labelledby="start-kitchen">
          <Typography id="start-kitchen" variant="h2">
            Start a kitchen
          </Typography>
          <Card>
            <CardContent sx={{ p: { xs: 2.5, sm: 3 } }}>
              <CreateKitchenForm onCreated={(kitchen) => void navigate(paths.kitchen(kitchen.id))} />
            </CardContent>
          </Card>
        </Stack>
      </Stack>
    </>
  );
}
