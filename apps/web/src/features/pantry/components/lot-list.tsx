import ReportProblem from '@mui/icons-material/ReportProblem';
import type { LotView } from '@jarday/contracts';
import { JAR_SIZE_LABELS } from '@jarday/rules';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Grid from '@mui/material/Grid';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { calendarDate, jarsWord } from '../utils/pantry-labels';

/** Flagged lots first (they need a look), then the one to eat first: earliest best-quality date. */
export function pantryOrder(lots: readonly LotView[]): LotView[] {
  return [...lots].sort(
    (a, b) =>
      Number(b.flaggedAt !== null) - Number(a.flaggedAt !== null) ||
      a.bestBy.localeCompare(b.bestBy) ||
      a.code.localeCompare(b.code),
  );
}

/** The kitchen's lots as large cards, each opening the lot's page. */
export function LotList({ kitchenId, lots }: { kitchenId: string; lots: readonly LotView[] }) {
  return (
    <Grid container spacing={2} component="ul" aria-label="Lots" sx={{ m: 0, p: 0, listStyle: 'none' }}>
      {pantryOrder(lots).map((lot) => (
        <Grid key={lot.id} size={{ xs: 12, sm: 6 }} component="li">
          <Card
            sx={{
              height: '100%',
              borderColor: lot.flaggedAt ? 'error.main' : undefined,
              borderWidth: lot.flaggedAt ? 3 : 1,
            }}
          >
            <CardActionArea component={RouterLink} to={paths.lot(kitchenId, lot.id)} sx={{ height: '100%' }}>
              <CardContent>
                <Stack spacing={0.75}>
                  <Typography variant="h3" component="h2" sx={{ fontWeight: 700 }}>
                    {lot.recipeName}
                  </Typography>
                  <Typography sx={{ color: 'text.secondary' }}>
                    Lot {lot.code} · {JAR_SIZE_LABELS[lot.jarSize].toLowerCase()} · canned {calendarDate(lot.dayDate)}
                  </Typography>
                  <Typography sx={{ fontSize: '1.35rem' }}>
                    <strong>{jarsWord(lot.onShelf)}</strong> on the shelf of {lot.sealed} sealed
                  </Typography>
                  <Typography>
                    Best by {calendarDate(lot.bestBy)}
                    {lot.location ? ` · ${lot.location}` : ''}
                  </Typography>
                  {lot.flaggedAt ? (
                    <Chip
                      icon={<ReportProblem />}
                      color="error"
                      label="Spoilage reported: look at every jar"
                      sx={{ alignSelf: 'flex-start' }}
                    />
                  ) : null}
                </Stack>
              </CardContent>
            </CardActionArea>
          </Card>
        </Grid>
      ))}
    </Grid>
  );
}
