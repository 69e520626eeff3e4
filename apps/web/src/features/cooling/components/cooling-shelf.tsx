import type { CannerView, Role } from '@jarday/contracts';
import { CAUTIONS } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { formatDate } from '../../../lib/labels';
import type { CoolingShelf as Shelf } from '../api/get-cooling-shelf';
import { CoolingLoadCard } from './cooling-load-card';
import { SealRateLine } from './seal-rate';

interface CoolingShelfProps {
  kitchenId: string;
  role: Role;
  shelf: Shelf;
  canners: readonly CannerView[];
  boardPath: (dayId: string) => string;
  /** Seal checks change the pantry: the route refreshes it. */
  onJarsChanged?: () => void;
}

/** The cooling shelf: loads by canning day, newest day first, each day with its seal rate. */
export function CoolingShelf({ kitchenId, role, shelf, canners, boardPath, onJarsChanged }: CoolingShelfProps) {
  const numberOf = new Map(shelf.loads.map((l) => [l.loadId, l.number]));
  return (
    <Stack spacing={4}>
      {shelf.loads.length === 0 ? (
        <Alert severity="info">
          No jars on the cooling shelf. A load appears here when its jars are lifted out of the canner.
        </Alert>
      ) : null}
      {shelf.days.map((day) => {
        const loads = shelf.loads.filter((l) => l.dayId === day.dayId);
        const headingId = `day-${day.dayId}`;
        return (
          <Stack key={day.dayId} component="section" spacing={2} aria-labelledby={headingId}>
            <Stack spacing={0.5}>
              <Typography id={headingId} variant="h2">
                {day.title} · {formatDate(`${day.date}T12:00:00`)}
              </Typography>
              <SealRateLine rate={day.sealRate} label={`Seal rate of ${day.title}`} />
            </Stack>
            {loads.length === 0 ? (
              <Typography sx={{ color: 'text.secondary' }}>No load of this day has been lifted out yet.</Typography>
            ) : (
              <Box
                sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', md: 'repeat(2, minmax(0, 1fr))' } }}
              >
                {loads.map((load) => (
                  <CoolingLoadCard
                    key={load.loadId}
                    kitchenId={kitchenId}
                    role={role}
                    load={load}
                    offsetMs={shelf.offsetMs}
                    canners={canners}
                    reprocessOfNumber={load.reprocessOf ? numberOf.get(load.reprocessOf) : undefined}
                    boardPath={boardPath}
                    onJarsChanged={onJarsChanged}
                  />
                ))}
              </Box>
            )}
          </Stack>
        );
      })}
      <Alert severity="info" role="note">
        <AlertTitle>{CAUTIONS['suspect-jars'].title}</AlertTitle>
        {CAUTIONS['suspect-jars'].text} {CAUTIONS['local-guidance'].text}
      </Alert>
    </Stack>
  );
}
