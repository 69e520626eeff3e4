import type { Timer } from '@jarday/contracts';
import Box from '@mui/material/Box';
import LinearProgress from '@mui/material/LinearProgress';
import { countRender } from '../../../lib/render-counter';
import { useTicking } from '../hooks/use-ticking';
import { useLiveStore } from '../stores/live-store';
import { formatClock, leftOn, progressOf } from '../utils/format-clock';

/** Digit sizes: the board's are read from across the kitchen (at least 96 px on a tablet), the pocket's in hand. */
const SIZES = {
  board: { xs: 72, md: 108 },
  pocket: { xs: 60, sm: 72 },
  small: { xs: 40 },
} as const;

interface CountdownProps {
  timer: Timer;
  size?: keyof typeof SIZES;
  /** Server minus device time; the live store's estimate unless given. */
  offsetMs?: number;
  label?: string;
}

/**
 * The remaining time in large digits, counted on this device from the server's deadline and the clock offset. Only
 * this component re-renders as the seconds change.
 */
export function Countdown({ timer, size = 'board', offsetMs, label }: CountdownProps) {
  countRender('Countdown');
  const storeOffset = useLiveStore((s) => s.clockOffsetMs);
  const offset = offsetMs ?? storeOffset;
  const text = useTicking(() => formatClock(leftOn(timer, Date.now(), offset)));
  return (
    <Box
      component="span"
      role="timer"
      aria-label={label ? `${label}: ${text} left` : `${text} left`}
      data-testid="countdown"
      sx={{
        display: 'block',
        fontSize: SIZES[size],
        fontWeight: 700,
        lineHeight: 1,
        letterSpacing: '-0.02em',
        fontVariantNumeric: 'tabular-nums',
        whiteSpace: 'nowrap',
      }}
    >
      {text}
    </Box>
  );
}

/** The progress of the counting phase as a thick bar; ticks on its own, like the digits. */
export function TimerProgress({ timer, offsetMs, label }: Omit<CountdownProps, 'size'>) {
  const storeOffset = useLiveStore((s) => s.clockOffsetMs);
  const offset = offsetMs ?? storeOffset;
  const percent = useTicking(() => Math.round(progressOf(timer, Date.now(), offset) * 200) / 2);
  return (
    <LinearProgress
      variant="determinate"
      value={percent}
      aria-label={label ? `${label} progress` : 'Progress'}
      sx={{ height: 14, borderRadius: 7 }}
    />
  );
}
