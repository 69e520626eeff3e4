import type { CoolingLoadView } from '@jarday/contracts';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useEverySecond } from '../hooks/use-every-second';
import { bandStage, clockAt, sinceText, untilText } from '../utils/shelf-times';

interface LoadTimesProps {
  load: CoolingLoadView;
  offsetMs: number;
  /** Whether any jar of the load did not seal: then its reprocess deadline matters. */
  unsealed: boolean;
}

/** A line of the shelf's times, its words large enough to read from across the kitchen. */
function Line({ label, value, at, big = false }: { label: string; value: string; at?: string; big?: boolean }) {
  return (
    <Box>
      <Typography component="span" sx={{ fontSize: big ? '1.6rem' : '1.2rem', fontWeight: big ? 700 : 500 }}>
        {label} {value}
      </Typography>
      {at ? (
        <Typography component="span" sx={{ color: 'text.secondary', fontSize: '1.05rem' }}>
          {' '}
          ({clockAt(at)})
        </Typography>
      ) : null}
    </Box>
  );
}

/**
 * Time since lifting, when the bands may come off (12 h) and when it is best (24 h), and the reprocess deadline
 * (24 h) for jars that did not seal: USDA Complete Guide to Home Canning, Guide 1. Counted on this device from the
 * server's times and the clock offset; only this part re-renders as the minutes change.
 */
export function LoadTimes({ load, offsetMs, unsealed }: LoadTimesProps) {
  const serverNow = useEverySecond(() => Math.floor((Date.now() + offsetMs) / 1000) * 1000);
  const stage = bandStage(load, serverNow);
  return (
    <Stack spacing={0.75} data-testid="load-times" data-stage={stage}>
      <Line label="Lifted out" value={`${sinceText(load.liftedAt, serverNow)} ago`} at={load.liftedAt} />
      {stage === 'resting' ? (
        <>
          <Box role="timer" aria-live="off">
            <Line
              label="Bands may come off"
              value={untilText(load.bandsEarliestAt, serverNow)}
              at={load.bandsEarliestAt}
              big
            />
          </Box>
          <Line
            label="Best at 24 hours:"
            value={untilText(load.bandsRecommendedAt, serverNow)}
            at={load.bandsRecommendedAt}
          />
        </>
      ) : null}
      {stage === 'may-come-off' ? (
        <>
          <Line label="Bands may come off" value="now" big />
          <Line
            label="Best at 24 hours:"
            value={untilText(load.bandsRecommendedAt, serverNow)}
            at={load.bandsRecommendedAt}
          />
        </>
      ) : null}
      {stage === 'recommended' ? <Line label="Cooled 24 hours: bands off and" value="check every seal" big /> : null}
      {unsealed ? (
        <Line
          label="Unsealed jars: reprocess"
          value={
            Date.parse(load.reprocessDeadline) > serverNow
              ? untilText(load.reprocessDeadline, serverNow)
              : 'no longer (the 24 hours have passed)'
          }
          at={load.reprocessDeadline}
        />
      ) : null}
    </Stack>
  );
}
