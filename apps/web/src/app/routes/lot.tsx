import type { KitchenView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { AttachmentsPanel } from '../../features/attachments';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { lotQueryOptions, useLot } from '../../features/pantry/api/get-lot';
import { LotDetail } from '../../features/pantry/components/lot-detail';
import { ApiError } from '../../lib/api-client';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const kitchenId = params.kitchenId ?? '';
    return ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(kitchenId)),
        queryClient.ensureQueryData(lotQueryOptions(kitchenId, params.lotId ?? '')),
      ]),
    );
  };

function LotPage({ kitchen }: { kitchen: KitchenView }) {
  const { lotId = '' } = useParams();
  const lot = useLot(kitchen.id, lotId);
  const back = { to: paths.pantry(kitchen.id), label: 'Pantry' };

  if (lot.isPending) return <Loading label="Loading the lot" />;
  if (lot.isError) {
    const missing = lot.error instanceof ApiError && lot.error.status === 404;
    return (
      <>
        <PageHeader title="Lot" back={back} />
        {missing ? (
          <Stack spacing={3}>
            <Alert severity="error">This lot is not in {kitchen.name}&apos;s pantry.</Alert>
            <Button component={RouterLink} to={back.to} variant="contained" sx={{ alignSelf: 'flex-start' }}>
              See the pantry
            </Button>
          </Stack>
        ) : (
          <QueryError error={lot.error} onRetry={() => void lot.refetch()} />
        )}
      </>
    );
  }
  return (
    <>
      <PageHeader title={lot.data.recipeName} subtitle={`Lot ${lot.data.code} · ${kitchen.name}`} back={back} />
      <Stack spacing={3}>
        <LotDetail kitchenId={kitchen.id} role={kitchen.role} lot={lot.data} />
        <AttachmentsPanel kitchenId={kitchen.id} role={kitchen.role} subject="lot" subjectId={lot.data.id} />
      </Stack>
    </>
  );
}

/** /kitchens/:kitchenId/pantry/:lotId: a lot's jars, its book of gifts and spoilage, labels and attachments. */
export default function LotRoute() {
  return <WithKitchen>{(kitchen) => <LotPage kitchen={kitchen} />}</WithKitchen>;
}
