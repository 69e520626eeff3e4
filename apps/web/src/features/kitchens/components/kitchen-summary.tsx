import type { KitchenView } from '@jarday/contracts';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from '../../../lib/labels';
import { formatAltitude } from '../utils/altitude';

const UNIT_LABELS = { us: 'US customary', metric: 'Metric' } as const;

/** The facts of a kitchen as a definition list: altitude, units, members and my role. */
export function KitchenSummary({ kitchen }: { kitchen: KitchenView }) {
  const rows: [string, string][] = [
    ['Altitude', formatAltitude(kitchen.altitude)],
    ['Units', UNIT_LABELS[kitchen.units]],
    ['Members', String(kitchen.memberCount)],
    ['My role', `${ROLE_LABELS[kitchen.role]}: ${ROLE_DESCRIPTIONS[kitchen.role]}`],
  ];
  return (
    <Stack component="dl" spacing={1.5} sx={{ m: 0 }}>
      {rows.map(([term, value]) => (
        <Stack key={term} direction={{ xs: 'column', sm: 'row' }} sx={{ gap: { xs: 0, sm: 2 } }}>
          <Typography component="dt" sx={{ fontWeight: 500, minWidth: 120 }}>
            {term}
          </Typography>
          <Typography component="dd" sx={{ m: 0, color: 'text.secondary' }}>
            {value}
          </Typography>
        </Stack>
      ))}
    </Stack>
  );
}
