import EventNote from '@mui/icons-material/EventNote';
import Groups from '@mui/icons-material/Groups';
import Kitchen from '@mui/icons-material/Kitchen';
import MenuBook from '@mui/icons-material/MenuBook';
import Tune from '@mui/icons-material/Tune';
import type { KitchenView } from '@jarday/contracts';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Grid from '@mui/material/Grid';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link as RouterLink, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { dayPaths } from '../../features/day/utils/day-paths';
import { YesterdayButton } from '../../features/journal/components/yesterday-button';
import { yesterdayQueryOptions } from '../../features/journal/api/journal-api';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { CanningCautions } from '../../features/kitchens/components/canning-cautions';
import { KitchenSummary } from '../../features/kitchens/components/kitchen-summary';
import { ROLE_LABELS } from '../../lib/labels';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(params.kitchenId ?? '')),
        queryClient.ensureQueryData(yesterdayQueryOptions(params.kitchenId ?? '')),
      ]),
    );

function Tile({ to, icon, title, text }: { to: string; icon: ReactNode; title: string; text: string }) {
  return (
    <Card sx={{ height: '100%' }}>
      <CardActionArea component={RouterLink} to={to} sx={{ height: '100%', minHeight: 120 }}>
        <CardContent>
          <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
            <Stack sx={{ color: 'primary.main', fontSize: 40 }}>{icon}</Stack>
            <Stack spacing={0.5}>
              <Typography variant="h3" component="h2">
                {title}
              </Typography>
              <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                {text}
              </Typography>
            </Stack>
          </Stack>
        </CardContent>
      </CardActionArea>
    </Card>
  );
}

function KitchenHome({ kitchen }: { kitchen: KitchenView }) {
  const lead = kitchen.role === 'lead';
  return (
    <>
      <PageHeader
        title={kitchen.name}
        subtitle={`You are ${ROLE_LABELS[kitchen.role].toLowerCase()} here.`}
        back={{ to: paths.kitchens(), label: 'My kitchens' }}
      />
      <Stack spacing={4}>
        <YesterdayButton kitchenId={kitchen.id} href={(dayId) => paths.journal(kitchen.id, dayId)} />
        <Grid container spacing={2} component="nav" aria-label="Kitchen pages">
          <Grid size={{ xs: 12, sm: 6 }}>
            <Tile
              to={dayPaths.list(kitchen.id)}
              icon={<EventNote fontSize="inherit" />}
              title="Canning days"
              text={
                lead
                  ? 'Start a day, plan its loads, open the Counter board.'
                  : 'Open the Counter board or the Pocket view.'
              }
            />
          </Grid>
          <Grid size={{ xs: 12, sm: 6 }}>
            <Tile
              to={paths.recipes(kitchen.id)}
              icon={<MenuBook fontSize="inherit" />}
              title="Recipe box"
              text={lead ? 'Tested recipes, their process tables and sources.' : 'Tested recipes and their times.'}
            />
          </Grid>
          <Grid size={{ xs: 12, sm: 6 }}>
            <Tile
              to={paths.members(kitchen.id)}
              icon={<Groups fontSize="inherit" />}
              title="Members & invites"
              text={lead ? 'See who is in, change roles, invite helpers.' : 'See who is in the kitchen.'}
            />
          </Grid>
          <Grid size={{ xs: 12, sm: 6 }}>
            <Tile
              to={paths.settings(kitchen.id)}
              icon={<Tune fontSize="inherit" />}
              title="Settings & canners"
              text={lead ? 'Altitude, units and the canners you own.' : 'Altitude, units and canners.'}
            />
          </Grid>
          <Grid size={{ xs: 12, sm: 6 }}>
            <Tile
              to={paths.cooling(kitchen.id)}
              icon={<Kitchen fontSize="inherit" />}
              title="Cooling shelf & pantry"
              text="Bands off, seal checks, then the jars: lots, gifts and labels."
            />
          </Grid>
        </Grid>
        <Stack component="section" spacing={2} aria-labelledby="about-kitchen">
          <Typography id="about-kitchen" variant="h2">
            About this kitchen
          </Typography>
          <Card>
            <CardContent>
              <KitchenSummary kitchen={kitchen} />
            </CardContent>
          </Card>
        </Stack>
        <CanningCautions />
      </Stack>
    </>
  );
}

export default function KitchenRoute() {
  return <WithKitchen>{(kitchen) => <KitchenHome kitchen={kitchen} />}</WithKitchen>;
}
