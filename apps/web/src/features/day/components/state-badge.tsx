import Cancel from '@mui/icons-material/Cancel';
import CheckCircle from '@mui/icons-material/CheckCircle';
import HourglassTop from '@mui/icons-material/HourglassTop';
import NotificationsActive from '@mui/icons-material/NotificationsActive';
import PlayArrow from '@mui/icons-material/PlayArrow';
import RadioButtonUnchecked from '@mui/icons-material/RadioButtonUnchecked';
import Stop from '@mui/icons-material/Stop';
import Box from '@mui/material/Box';
import type { ReactElement } from 'react';
import type { PhaseShape, PhaseTone } from '../utils/load-phase';

const SHAPES: Record<PhaseShape, ReactElement> = {
  'open-circle': <RadioButtonUnchecked fontSize="inherit" />,
  hourglass: <HourglassTop fontSize="inherit" />,
  play: <PlayArrow fontSize="inherit" />,
  bell: <NotificationsActive fontSize="inherit" />,
  square: <Stop fontSize="inherit" />,
  check: <CheckCircle fontSize="inherit" />,
  cross: <Cancel fontSize="inherit" />,
};

export const TONE_COLOURS: Record<PhaseTone, string> = {
  idle: 'text.secondary',
  waiting: 'warning.main',
  counting: 'primary.main',
  attention: 'secondary.main',
  finished: 'text.primary',
};

/** A state in words, with a shape and a colour: never colour alone, for cooks who cannot tell them apart. */
export function StateBadge({
  title,
  shape,
  tone,
  big = false,
}: {
  title: string;
  shape: PhaseShape;
  tone: PhaseTone;
  big?: boolean;
}) {
  return (
    <Box
      data-shape={shape}
      sx={{
        display: 'inline-flex',
        alignItems: 'center',
        gap: 1,
        alignSelf: 'flex-start',
        px: 1.5,
        py: 0.5,
        border: 3,
        borderRadius: 999,
        borderColor: TONE_COLOURS[tone],
        borderStyle: tone === 'waiting' ? 'dashed' : 'solid',
        color: TONE_COLOURS[tone],
        fontWeight: 700,
        fontSize: big ? '1.5rem' : '1.125rem',
        lineHeight: 1.2,
      }}
    >
      <Box component="span" aria-hidden sx={{ display: 'flex', fontSize: big ? 32 : 24 }}>
        {SHAPES[shape]}
      </Box>
      <span>{title}</span>
    </Box>
  );
}
