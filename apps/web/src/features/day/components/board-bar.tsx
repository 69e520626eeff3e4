import ArrowBack from '@mui/icons-material/ArrowBack';
import DarkMode from '@mui/icons-material/DarkMode';
import LightMode from '@mui/icons-material/LightMode';
import PhoneIphone from '@mui/icons-material/PhoneIphone';
import Button from '@mui/material/Button';
import IconButton from '@mui/material/IconButton';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import type { BoardScheme } from '../hooks/use-board-scheme';
import type { WakeLockState } from '../hooks/use-wake-lock';
import { ConnectionChip } from './connection-chip';
import { SoundSwitch } from './sound-switch';

interface BoardBarProps {
  title: string;
  backHref: string;
  backLabel: string;
  scheme: BoardScheme;
  onToggleScheme: () => void;
  wakeLock?: WakeLockState;
  onPhone?: () => void;
  phoneOpen?: boolean;
  compact?: boolean;
}

/** The strip above the stations: the way back, the day, the link's state, sound, screen, phone join, colours. */
export function BoardBar({
  title,
  backHref,
  backLabel,
  scheme,
  onToggleScheme,
  wakeLock,
  onPhone,
  phoneOpen,
  compact = false,
}: BoardBarProps) {
  return (
    <Stack
      component="header"
      direction="row"
      sx={{
        alignItems: 'center',
        gap: compact ? 1 : 2,
        flexWrap: 'wrap',
        px: compact ? 1.5 : 3,
        py: 1,
        bgcolor: 'background.paper',
        borderBottom: 1,
        borderColor: 'divider',
      }}
    >
      <IconButton component={RouterLink} to={backHref} aria-label={backLabel} color="inherit">
        <ArrowBack />
      </IconButton>
      <Typography
        component="h1"
        sx={{
          fontSize: compact ? '1.3rem' : '1.6rem',
          fontWeight: 700,
          flex: 1,
          minWidth: 0,
          overflow: 'hidden',
          textOverflow: 'ellipsis',
          whiteSpace: 'nowrap',
        }}
      >
        {title}
      </Typography>
      <ConnectionChip />
      {wakeLock && !compact ? (
        <Typography sx={{ color: 'text.secondary', fontSize: '0.95rem' }}>
          {wakeLock === 'held' ? 'Screen stays on' : 'Screen may sleep'}
        </Typography>
      ) : null}
      <SoundSwitch dense />
      {onPhone ? (
        <Button
          variant={phoneOpen ? 'contained' : 'outlined'}
          color="inherit"
          startIcon={<PhoneIphone />}
          onClick={onPhone}
          aria-expanded={phoneOpen}
          sx={{ minHeight: 56 }}
        >
          Phones
        </Button>
      ) : null}
      <IconButton
        onClick={onToggleScheme}
        color="inherit"
        aria-label={scheme === 'dark' ? 'Bright colours' : 'Dim colours'}
      >
        {scheme === 'dark' ? <LightMode /> : <DarkMode />}
      </IconButton>
    </Stack>
  );
}
