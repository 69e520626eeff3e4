import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../../config/paths';

/** Planning needs a canner: say where to add one. */
export function NoCanners({ kitchenId }: { kitchenId: string }) {
  return (
    <Alert severity="info">
      This kitchen has no canners yet. Add one under{' '}
      <Link component={RouterLink} to={paths.settings(kitchenId)}>
        Settings &amp; canners
      </Link>{' '}
      to plan a load.
    </Alert>
  );
}
