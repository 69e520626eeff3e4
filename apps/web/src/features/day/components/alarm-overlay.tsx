import NotificationsActive from '@mui/icons-material/NotificationsActive';
import type { Timer } from '@jarday/contracts';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { keyframes } from '@mui/material/styles';
import { useSoundStore } from '../stores/sound-store';
import type { BoardAction } from '../utils/timer-actions';
import { acknowledgeAction } from '../utils/timer-actions';
import { ActionButtons } from './action-buttons';
import { SoundSwitch } from './sound-switch';

/** One flash a second: well under the three a second that can trigger seizures (WCAG 2.2, 2.3.1). */
const flash = keyframes`
  0%, 49% { background-color: var(--mui-palette-secondary-main); color: var(--mui-palette-secondary-contrastText); }
  50%, 100% { background-color: var(--mui-palette-background-default); color: var(--mui-palette-text-primary); }
`;

/** What the alarm asks of a person, by its reason and the kind of timer. */
export function alarmInstruction(timer: Timer): string {
  const reason = timer.alarm?.reason;
  if (reason === 'vented') return 'Venting done: close the vent or put the weight on.';
  if (reason === 'may-open') return 'The 10 minutes after zero are up: open the lid, tilted away from you.';
  switch (timer.kind) {
    case 'process':
      return 'Full process time: turn off the heat and take the lid off.';
    case 'pressure-process':
      return 'Full time at pressure: turn off the heat and let the pressure fall by itself.';
    case 'blanch':
      return 'Out of the boiling water and into cold water.';
    case 'canner-rest':
      return 'The 5 minutes are up: lift the jars out, upright.';
    case 'cooling-rest':
      return '12 hours of cooling: the bands may come off. Check every seal.';
    default:
      return 'The time is up.';
  }
}

interface AlarmOverlayProps {
  alarms: Timer[];
  run: (action: BoardAction) => Promise<string | null>;
  canCommand: boolean;
  compact?: boolean;
}

/**
 * The whole screen flashes while an alarm of the day is up, with what to do and a big Acknowledge. An
 * acknowledgement from any device clears it here too: the server broadcasts it and the alarm leaves the list.
 */
export function AlarmOverlay({ alarms, run, canCommand, compact = false }: AlarmOverlayProps) {
  const sounding = useSoundStore((s) => s.sounding);
  if (alarms.length === 0) return null;
  return (
    <Box
      role="alertdialog"
      aria-modal="true"
      aria-labelledby="alarm-title"
      data-testid="alarm-overlay"
      data-sound={sounding ? 'playing' : 'silent'}
      sx={{
        position: 'fixed',
        inset: 0,
        zIndex: 1400,
        display: 'grid',
        placeItems: 'center',
        p: compact ? 2 : 4,
        overflow: 'auto',
        bgcolor: 'background.default',
        animation: `${flash} 1s steps(1, end) infinite`,
        '@media (prefers-reduced-motion: reduce)': { animation: 'none', border: 16, borderColor: 'secondary.main' },
      }}
    >
      <Stack
        spacing={3}
        sx={{
          width: '100%',
          maxWidth: 720,
          bgcolor: 'background.paper',
          color: 'text.primary',
          borderRadius: 6,
          p: compact ? 2.5 : 4,
          border: 4,
          borderColor: 'secondary.main',
        }}
      >
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
          <NotificationsActive sx={{ fontSize: compact ? 48 : 72, color: 'secondary.main' }} aria-hidden />
          <Typography id="alarm-title" variant="h2" sx={{ fontSize: compact ? '2rem' : '3rem', fontWeight: 800 }}>
            Time is up
          </Typography>
        </Stack>
        {alarms.map((t) => (
          <Stack key={t.id} spacing={1.5} data-testid="alarm" data-timer-id={t.id}>
            <Typography sx={{ fontSize: compact ? '1.6rem' : '2.2rem', fontWeight: 700, lineHeight: 1.15 }}>
              {t.label}
            </Typography>
            <Typography sx={{ fontSize: compact ? '1.25rem' : '1.6rem' }}>{alarmInstruction(t)}</Typography>
            <ActionButtons
              actions={acknowledgeAction(t)}
              run={run}
              canCommand={canCommand}
              size={compact ? 'pocket' : 'board'}
              context={t.label}
            />
          </Stack>
        ))}
        {!canCommand ? <Typography>Watchers see the alarm; a lead or a helper acknowledges it.</Typography> : null}
        <SoundSwitch />
      </Stack>
    </Box>
  );
}
