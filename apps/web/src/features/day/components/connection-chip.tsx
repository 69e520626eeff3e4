import CloudOff from '@mui/icons-material/CloudOff';
import FiberManualRecord from '@mui/icons-material/FiberManualRecord';
import Sync from '@mui/icons-material/Sync';
import Block from '@mui/icons-material/Block';
import Box from '@mui/material/Box';
import type { ReactElement } from 'react';
import { useLiveStore, type LiveConnection } from '../stores/live-store';

const SHOWN: Record<LiveConnection, { text: string; icon: ReactElement; colour: string }> = {
  idle: { text: 'Not connected', icon: <CloudOff fontSize="inherit" />, colour: 'text.secondary' },
  connecting: { text: 'Connecting', icon: <Sync fontSize="inherit" />, colour: 'warning.main' },
  live: { text: 'Live', icon: <FiberManualRecord fontSize="inherit" />, colour: 'primary.main' },
  reconnecting: { text: 'Reconnecting', icon: <Sync fontSize="inherit" />, colour: 'warning.main' },
  offline: { text: 'Offline', icon: <CloudOff fontSize="inherit" />, colour: 'warning.main' },
  refused: { text: 'Not joined', icon: <Block fontSize="inherit" />, colour: 'error.main' },
};

/** The link's state in a word and a shape, always in view. */
export function ConnectionChip() {
  const connection = useLiveStore((s) => s.connection);
  const shown = SHOWN[connection];
  return (
    <Box
      role="status"
      aria-label={`Connection: ${shown.text}`}
      data-testid="connection"
      data-connection={connection}
      sx={{
        display: 'inline-flex',
        alignItems: 'center',
        gap: 0.75,
        color: shown.colour,
        fontWeight: 700,
        fontSize: '1.05rem',
        whiteSpace: 'nowrap',
      }}
    >
      <Box component="span" aria-hidden sx={{ display: 'flex', fontSize: 22 }}>
        {shown.icon}
      </Box>
      {shown.text}
    </Box>
  );
}
