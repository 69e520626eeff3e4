import type { CannerView, CoolingLoadView, Role } from '@jarday/contracts';
import { JAR_SIZE_LABELS } from '@jarday/rules';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Divider from '@mui/material/Divider';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { useEverySecond } from '../hooks/use-every-second';
import { BandsOffControl } from './bands-off-control';
import { LoadTimes } from './load-times';
import { ReprocessPanel } from './reprocess-panel';
import { SealCheckTiles } from './seal-check-tiles';

export interface CoolingLoadCardProps {
  kitchenId: string;
  role: Role;
  load: CoolingLoadView;
  offsetMs: number;
  canners: readonly CannerView[];
  /** The number of the load that this one reprocesses, when it is on the shelf too. */
  reprocessOfNumber?: number;
  boardPath: (dayId: string) => string;
  onJarsChanged?: () => void;
}

/** One load on the cooling shelf: its times, the bands, the seal check per jar and, if needed, reprocessing. */
export function CoolingLoadCard(props: CoolingLoadCardProps) {
  const { kitchenId, role, load, offsetMs } = props;
  const titleId = `load-${load.loadId}`;
  // Re-renders only when the 24-hour reprocess window closes, not every second.
  const reprocessOpen = useEverySecond(() => Date.now() + offsetMs < Date.parse(load.reprocessDeadline));
  const canCommand = role !== 'watcher';
  const unsealed = load.sealChecks.some((c) => c.result === 'unsealed');
  // The tiles start again from the server's checks whenever they change, on this device or another.
  const checksKey = load.sealChecks.map((c) => `${c.jarNumber}${c.result}${c.outcome}`).join(',');

  return (
    <Card component="article" aria-labelledby={titleId} data-testid="cooling-load" data-load-number={load.number}>
      <CardContent>
        <Stack spacing={2}>
          <Stack spacing={0.5}>
            <Typography id={titleId} variant="h3" component="h3" sx={{ fontSize: '1.5rem', fontWeight: 700 }}>
              Load {load.number} · {load.recipeName}
            </Typography>
            <Typography sx={{ color: 'text.secondary' }}>
              {load.jars} {JAR_SIZE_LABELS[load.jarSize].toLowerCase()} jars · {load.cannerName}
            </Typography>
            {load.reprocessOf ? (
              <Chip
                sx={{ alignSelf: 'flex-start' }}
                color="secondary"
                variant="outlined"
                label={
                  props.reprocessOfNumber ? `Reprocessed jars of load ${props.reprocessOfNumber}` : 'Reprocessed jars'
                }
              />
            ) : null}
          </Stack>
          <LoadTimes load={load} offsetMs={offsetMs} unsealed={unsealed} />
          <BandsOffControl kitchenId={kitchenId} load={load} role={role} />
          <Divider />
          {load.bandsOffAt ? (
            <SealCheckTiles
              key={checksKey}
              kitchenId={kitchenId}
              load={load}
              reprocessOpen={reprocessOpen}
              canCheck={canCommand}
              onSaved={props.onJarsChanged}
            />
          ) : (
            <Typography sx={{ color: 'text.secondary' }}>
              Leave the jars undisturbed and do not retighten the bands. Check the seals once the bands are off.
            </Typography>
          )}
          {load.lot ? (
            <Link component={RouterLink} to={paths.lot(kitchenId, load.lot.id)} sx={{ fontSize: '1.1rem' }}>
              In the pantry as lot {load.lot.code}
            </Link>
          ) : null}
          <ReprocessPanel
            kitchenId={kitchenId}
            load={load}
            canners={props.canners}
            reprocessOpen={reprocessOpen}
            canCommand={canCommand}
            boardPath={props.boardPath}
          />
        </Stack>
      </CardContent>
    </Card>
  );
}
