import Box from '@mui/material/Box';
import type { ReactNode } from 'react';
import type { BoardScheme } from '../hooks/use-board-scheme';
import { useSoundStore } from '../stores/sound-store';

/**
 * The whole window for a live day, above the app's own bar: the board is a kitchen screen, not a page among pages.
 * It lies over the layout (not fixed), so the document itself scrolls and a long board prints and captures whole.
 * The colour scheme is the theme's class on this root, so the rest of the app keeps its own.
 */
export function LiveScreen({ scheme, testId, children }: { scheme: BoardScheme; testId: string; children: ReactNode }) {
  const sounding = useSoundStore((s) => s.sounding);
  return (
    <Box
      className={scheme}
      data-testid={testId}
      data-alarm-sound={sounding ? 'playing' : 'stopped'}
      sx={{
        position: 'absolute',
        top: 0,
        left: 0,
        right: 0,
        minHeight: '100vh',
        zIndex: 1200,
        bgcolor: 'background.default',
        color: 'text.primary',
      }}
    >
      {children}
    </Box>
  );
}
