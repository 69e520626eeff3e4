import type { KitchenView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import type { ReactNode } from 'react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { useKitchen } from '../../features/kitchens/api/get-kitchen';
import { ApiError } from '../../lib/api-client';

/** Loads the kitchen named in the path for a page; a kitchen I am not in reads as not found. */
export function WithKitchen({ children }: { children: (kitchen: KitchenView) => ReactNode }) {
  const { kitchenId = '' } = useParams();
  const kitchen = useKitchen(kitchenId);
  if (kitchen.isPending) return <Loading label="Loading the kitchen" />;
  if (kitchen.isError) {
    if (kitchen.error instanceof ApiError && kitchen.error.status === 404) {
      return (
        <Stack spacing={3}>
          <Alert severity="error">This kitchen does not exist, or you are not one of its members.</Alert>
          <Button component={RouterLink} to={paths.kitchens()} variant="contained" sx={{ alignSelf: 'flex-start' }}>
            Go to my kitchens
          </Button>
        </Stack>
      );
    }
    return <QueryError error={kitchen.error} onRetry={() => void kitchen.refetch()} />;
  }
  return children(kitchen.data);
}

/** Warms the cache before a kitchen page renders; a failure is left for the page to show. */
export async function ensureQuietly(promise: Promise<unknown>): Promise<null> {
  await promise.catch(() => undefined);
  return null;
}
