import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { TimerPreset } from '../utils/presets';
import type { BoardAction } from '../utils/timer-actions';
import { ActionButtons } from './action-buttons';

interface PresetButtonsProps {
  title: string;
  presets: TimerPreset[];
  run: (action: BoardAction) => Promise<string | null>;
  canCommand: boolean;
}

/** One tap starts a timer: "Start a blanch dip: 30 s, 45 s, 60 s". */
export function PresetButtons({ title, presets, run, canCommand }: PresetButtonsProps) {
  if (!canCommand || presets.length === 0) return null;
  const actions: BoardAction[] = presets.map((p) => ({
    kind: 'start',
    id: p.id,
    label: p.label,
    spoken: p.spoken,
    tone: 'plain',
    acknowledge: [],
    timer: p.timer,
  }));
  return (
    <Stack spacing={1} role="group" aria-label={title}>
      <Typography sx={{ fontWeight: 700, fontSize: '1.1rem' }}>{title}</Typography>
      <ActionButtons actions={actions} run={run} canCommand={canCommand} />
    </Stack>
  );
}
