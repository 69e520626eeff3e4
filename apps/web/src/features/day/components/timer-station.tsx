import type { Timer } from '@jarday/contracts';
import type { TimerKind } from '@jarday/live';
import Divider from '@mui/material/Divider';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { simplePhase } from '../utils/load-phase';
import type { TimerPreset } from '../utils/presets';
import { alarmIsOn, simpleActions, type BoardAction } from '../utils/timer-actions';
import { ActionButtons } from './action-buttons';
import { PresetButtons } from './preset-buttons';
import { Countdown, TimerProgress } from './countdown';
import { StateBadge } from './state-badge';
import { StationCard } from './station-card';

const NEXT: Partial<Record<TimerKind, string>> = {
  blanch: 'Then straight into cold water; the skins slip off.',
  simmer: 'Stir now and then; keep it at the recipe’s heat.',
  'hot-hold': 'Keep the jars in the hot water until you fill them.',
  custom: '',
};

/** Timers worth a place on the board: those still to run, running or paused, and any whose alarm is up. */
export const isLive = (t: Timer) => ['ready', 'running', 'paused'].includes(t.state) || alarmIsOn(t);

interface TimerStationProps {
  title: string;
  icon: ReactNode;
  timers: Timer[];
  presets: TimerPreset[];
  presetsTitle: string;
  run: (action: BoardAction) => Promise<string | null>;
  canCommand: boolean;
  empty: string;
  children?: ReactNode;
  testId?: string;
}

/** A station of simple timers (prep dips, the simmer, hot jars): start one with a tap, pause, resume, +1 min. */
export function TimerStation({
  title,
  icon,
  timers,
  presets,
  presetsTitle,
  run,
  canCommand,
  empty,
  children,
  testId,
}: TimerStationProps) {
  const live = timers.filter(isLive);
  return (
    <StationCard title={title} icon={icon} attention={live.some(alarmIsOn)} testId={testId}>
      {live.length === 0 ? (
        <Typography sx={{ color: 'text.secondary', fontSize: '1.15rem' }}>{empty}</Typography>
      ) : null}
      {live.map((t, i) => (
        <Stack key={t.id} spacing={1.5} data-testid="simple-timer" data-timer-id={t.id}>
          {i > 0 ? <Divider /> : null}
          <Typography sx={{ fontSize: '1.35rem', fontWeight: 700 }}>{t.label}</Typography>
          <StateBadge {...simplePhase(t)} />
          <Countdown timer={t} label={t.label} />
          {t.deadlineAt !== null || t.state === 'paused' ? <TimerProgress timer={t} label={t.label} /> : null}
          {NEXT[t.kind] ? <Typography sx={{ fontSize: '1.1rem' }}>{NEXT[t.kind]}</Typography> : null}
          <ActionButtons actions={simpleActions(t)} run={run} canCommand={canCommand} context={t.label} />
        </Stack>
      ))}
      <PresetButtons title={presetsTitle} presets={presets} run={run} canCommand={canCommand} />
      {children}
    </StationCard>
  );
}
