import Kitchen from '@mui/icons-material/Kitchen';
import type { BatchView, LoadView, Timer } from '@jarday/contracts';
import { CAUTIONS } from '@jarday/rules';
import { formatDuration, MINUTE_MS } from '@jarday/live';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { useTicking } from '../hooks/use-ticking';
import { useLiveStore } from '../stores/live-store';
import { clockTime, loadTitle } from '../utils/labels';
import { leftOn } from '../utils/format-clock';
import { timersOfLoad } from '../utils/load-phase';
import { StationCard } from './station-card';

/** Time left to the minute, for waits measured in hours. */
function UntilBands({ timer }: { timer: Timer }) {
  const offset = useLiveStore((s) => s.clockOffsetMs);
  const text = useTicking(() => {
    const left = leftOn(timer, Date.now(), offset);
    return left <= 0 ? 'now' : `in ${formatDuration(Math.ceil(left / MINUTE_MS) * MINUTE_MS)}`;
  });
  return <strong>{text}</strong>;
}

interface CoolingSummaryProps {
  loads: LoadView[];
  batches: BatchView[];
  timers: Timer[];
  /** The full Cooling shelf page (bands off, seal checks), opened from the board. */
  shelfHref?: string;
}

/**
 * The cooling shelf in short: each lifted load, when it came out, and when its bands may come off (12 hours at the
 * earliest, 24 recommended: USDA Complete Guide, Guide 1).
 */
export function CoolingSummary({ loads, batches, timers, shelfHref }: CoolingSummaryProps) {
  const offset = useLiveStore((s) => s.clockOffsetMs);
  const cooling = loads
    .map((load) => ({ load, timer: timersOfLoad(load.id, timers).cooling }))
    .filter((x): x is { load: LoadView; timer: Timer } => x.timer !== null);
  return (
    <StationCard title="Cooling shelf" icon={<Kitchen fontSize="inherit" />} testId="cooling-shelf">
      {cooling.length === 0 ? (
        <Typography sx={{ color: 'text.secondary', fontSize: '1.15rem' }}>No jars cooling yet.</Typography>
      ) : (
        <Box component="ul" sx={{ m: 0, pl: 0, listStyle: 'none', display: 'grid', gap: 1.5 }}>
          {cooling.map(({ load, timer }) => {
            const lifted = (timer.phaseStartedAt ?? timer.createdAt) - offset;
            const due = timer.deadlineAt !== null ? timer.deadlineAt - offset : null;
            return (
              <Box component="li" key={load.id} sx={{ fontSize: '1.15rem' }}>
                <strong>
                  {loadTitle(
                    load,
                    batches.find((b) => b.id === load.batchId),
                  )}
                </strong>
                <br />
                Lifted {clockTime(lifted)}. Bands may come off {due !== null ? `from ${clockTime(due)}, ` : ''}
                <UntilBands timer={timer} />.
              </Box>
            );
          })}
        </Box>
      )}
      <Typography sx={{ fontSize: '1rem', color: 'text.secondary' }}>
        Leave jars undisturbed 12 to 24 hours; do not retighten the bands. {CAUTIONS['suspect-jars'].title}.
      </Typography>
      {shelfHref ? (
        <Link component={RouterLink} to={shelfHref} sx={{ fontSize: '1.15rem' }}>
          Open the cooling shelf: bands and seal checks
        </Link>
      ) : null}
    </StationCard>
  );
}
