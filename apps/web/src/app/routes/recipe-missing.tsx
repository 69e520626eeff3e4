import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { ApiError } from '../../lib/api-client';

/** A recipe page that cannot show its recipe: not in this kitchen (404), or the request failed. */
export function RecipeLoadError({
  kitchenId,
  error,
  onRetry,
}: {
  kitchenId: string;
  error: Error;
  onRetry: () => void;
}) {
  if (error instanceof ApiError && error.status === 404) {
    return <BackToBox kitchenId={kitchenId}>This recipe is not in this kitchen&apos;s recipe box.</BackToBox>;
  }
  return <QueryError error={error} onRetry={onRetry} />;
}

/** A message with the way back to the Recipe box. */
export function BackToBox({ kitchenId, children }: { kitchenId: string; children: ReactNode }) {
  return (
    <Stack spacing={3}>
      <Alert severity="info">{children}</Alert>
      <Button component={RouterLink} to={paths.recipes(kitchenId)} variant="contained" sx={{ alignSelf: 'flex-start' }}>
        Go to the recipe box
      </Button>
    </Stack>
  );
}
