import type { KitchenView } from '@jarday/contracts';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { ROLE_LABELS } from '../../../lib/labels';
import { formatAltitude } from '../utils/altitude';

/** My kitchens as large cards: name, my role and the altitude the times are worked out for. */
export function KitchenList({ kitchens }: { kitchens: KitchenView[] }) {
  if (kitchens.length === 0) {
    return (
      <Typography sx={{ color: 'text.secondary' }}>
        You are not in a kitchen yet. Start one below, or open an invite link from a lead.
      </Typography>
    );
  }
  return (
    <Stack component="ul" spacing={2} sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="My kitchens">
      {kitchens.map((k) => (
        <li key={k.id}>
          <Card>
            <CardActionArea component={RouterLink} to={paths.kitchen(k.id)} sx={{ minHeight: 88 }}>
              <CardContent>
                <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', gap: 2 }}>
                  <Stack spacing={0.5}>
                    <Typography variant="h3" component="h3">
                      {k.name}
                    </Typography>
                    <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                      Altitude {formatAltitude(k.altitude)} · {k.memberCount}{' '}
                      {k.memberCount === 1 ? 'member' : 'members'}
                    </Typography>
                  </Stack>
                  <Chip label={ROLE_LABELS[k.role]} color={k.role === 'lead' ? 'primary' : 'default'} />
                </Stack>
              </CardContent>
            </CardActionArea>
          </Card>
        </li>
      ))}
    </Stack>
  );
}
