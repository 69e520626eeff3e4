import NotificationsOff from '@mui/icons-material/NotificationsOff';
import PowerSettingsNew from '@mui/icons-material/PowerSettingsNew';
import ReportProblem from '@mui/icons-material/ReportProblem';
import Upload from '@mui/icons-material/Upload';
import Whatshot from '@mui/icons-material/Whatshot';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useState, type ReactElement } from 'react';
import type { BoardAction } from '../utils/timer-actions';

interface ActionButtonsProps {
  actions: BoardAction[];
  run: (action: BoardAction) => Promise<string | null>;
  /** Watchers follow the day; the server would refuse their taps, so they get none. */
  canCommand: boolean;
  /** The big buttons of the moments that matter stand 72 px tall; secondary ones 64 px. */
  size?: 'board' | 'pocket';
  /** Names the buttons for screen readers when several stations show the same verb. */
  context?: string;
}

const TONES = { go: 'primary', stop: 'error', plain: 'inherit' } as const;

/** A shape on the buttons of the moments that matter, so they differ by more than their colour. */
const ICONS: Record<string, ReactElement> = {
  'rolling-boil': <Whatshot />,
  'at-pressure': <Whatshot />,
  'boil-lost': <ReportProblem />,
  'pressure-lost': <ReportProblem />,
  acknowledge: <NotificationsOff />,
  'heat-off': <PowerSettingsNew />,
  lift: <Upload />,
};

/** The station's buttons, with the server's refusal shown beside them when a tap was refused. */
export function ActionButtons({ actions, run, canCommand, size = 'board', context }: ActionButtonsProps) {
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  if (!canCommand || actions.length === 0) return null;

  const tap = async (action: BoardAction) => {
    setBusy(action.id);
    setError(await run(action));
    setBusy(null);
  };
  const main = actions.filter((a) => a.tone !== 'plain');
  const minor = actions.filter((a) => a.tone === 'plain');

  return (
    <Stack spacing={1.5}>
      {main.map((a) => (
        <Button
          key={a.id}
          variant="contained"
          color={TONES[a.tone]}
          size="large"
          disabled={busy !== null}
          onClick={() => void tap(a)}
          aria-label={a.spoken ?? (context ? `${a.label}: ${context}` : undefined)}
          data-action={a.id}
          startIcon={ICONS[a.id]}
          sx={{
            '& .MuiButton-startIcon svg': { fontSize: 32 },
            minHeight: size === 'board' ? 80 : 72,
            fontSize: size === 'board' ? '1.6rem' : '1.35rem',
            fontWeight: 700,
          }}
        >
          {a.label}
        </Button>
      ))}
      {minor.length > 0 ? (
        <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
          {minor.map((a) => (
            <Button
              key={a.id}
              variant="outlined"
              color="inherit"
              disabled={busy !== null}
              onClick={() => void tap(a)}
              aria-label={a.spoken ?? (context ? `${a.label}: ${context}` : undefined)}
              data-action={a.id}
              sx={{ minHeight: 64, minWidth: 96, flex: '1 0 auto', fontSize: '1.2rem', whiteSpace: 'nowrap' }}
            >
              {a.label}
            </Button>
          ))}
        </Stack>
      ) : null}
      {error ? (
        <Alert severity="error" onClose={() => setError(null)}>
          {error}
        </Alert>
      ) : null}
    </Stack>
  );
}
