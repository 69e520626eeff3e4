import type { BatchView, LoadView, Timer } from '@jarday/contracts';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { paths } from '../../../config/paths';
import { useAlarmAlert } from '../hooks/use-alarm-alert';
import { useBoardScheme } from '../hooks/use-board-scheme';
import { useConfirmStep, type ConfirmStep } from '../hooks/use-confirm-step';
import { useDayTimers } from '../hooks/use-day-timers';
import { useLiveDay } from '../hooks/use-live-day';
import { useRunAction } from '../hooks/use-run-action';
import { loadTitle } from '../utils/labels';
import { loadPhase, simplePhase, timersOfLoad } from '../utils/load-phase';
import { prepPresets } from '../utils/presets';
import { loadSteps, timerStepDone } from '../utils/steps';
import { loadActions, simpleActions, type BoardAction } from '../utils/timer-actions';
import { ActionButtons } from './action-buttons';
import { AlarmOverlay } from './alarm-overlay';
import { PresetButtons } from './preset-buttons';
import { BoardBar } from './board-bar';
import { ConnectionBanner } from './connection-banner';
import { LiveScreen } from './live-screen';
import { CoolingSummary } from './cooling-summary';
import type { LiveDayProps } from './counter-board';
import { Countdown } from './countdown';
import { StateBadge } from './state-badge';
import { StepGuide } from './step-guide';
import { isLive } from './timer-station';

interface Common {
  run: (action: BoardAction) => Promise<string | null>;
  canCommand: boolean;
}

/** The next clocks to run out, soonest first: what will ring next. */
function NextAlarms({ timers }: { timers: Timer[] }) {
  const next = timers
    .filter((t) => t.deadlineAt !== null)
    .sort((a, b) => (a.deadlineAt ?? 0) - (b.deadlineAt ?? 0))
    .slice(0, 3);
  if (next.length === 0) return null;
  return (
    <Paper variant="outlined" sx={{ p: 2, borderRadius: 4 }} component="section" aria-label="Next alarms">
      <Typography variant="h2" sx={{ fontSize: '1.25rem', mb: 1 }}>
        Next alarms
      </Typography>
      {next.map((t) => (
        <Stack
          key={t.id}
          direction="row"
          sx={{ alignItems: 'center', justifyContent: 'space-between', gap: 1, py: 0.5 }}
        >
          <Typography sx={{ fontSize: '1.1rem', minWidth: 0 }}>{t.label}</Typography>
          <Countdown timer={t} size="small" label={t.label} />
        </Stack>
      ))}
    </Paper>
  );
}

function PocketLoad({
  load,
  batch,
  timers,
  confirm,
  run,
  canCommand,
}: Common & { load: LoadView; batch?: BatchView; timers: Timer[]; confirm: ConfirmStep }) {
  const own = timersOfLoad(load.id, timers);
  const phase = loadPhase(load, own);
  const title = loadTitle(load, batch);
  return (
    <Paper
      variant="outlined"
      component="section"
      aria-label={title}
      data-testid="pocket-load"
      data-phase={phase.phase}
      sx={{
        p: 2,
        borderRadius: 4,
        borderWidth: phase.tone === 'attention' ? 4 : 1,
        borderColor: phase.tone === 'attention' ? 'secondary.main' : 'divider',
      }}
    >
      <Stack spacing={1.5}>
        <Typography variant="h2" sx={{ fontSize: '1.3rem' }}>
          {load.cannerName}: {title}
        </Typography>
        <StateBadge title={phase.title} shape={phase.shape} tone={phase.tone} />
        {phase.clock && phase.phase !== 'time-up' && phase.phase !== 'lift' ? (
          <Countdown timer={phase.clock} size="pocket" label={title} />
        ) : null}
        <Typography sx={{ fontSize: '1.15rem' }}>{phase.next}</Typography>
        <ActionButtons
          actions={loadActions(load, own)}
          run={run}
          canCommand={canCommand}
          size="pocket"
          context={`load ${load.number}`}
        />
        <StepGuide
          name={`Load ${load.number}`}
          steps={loadSteps(load)}
          who={{ subject: 'load', id: load.id }}
          confirm={confirm}
          timerDone={(id) => timerStepDone(id, own)}
          headspace={load.plan.headspace}
          canCommand={canCommand}
          compact
        />
      </Stack>
    </Paper>
  );
}

function PocketTimer({ timer, run, canCommand }: Common & { timer: Timer }) {
  return (
    <Paper
      variant="outlined"
      component="section"
      aria-label={timer.label}
      data-testid="pocket-timer"
      sx={{ p: 2, borderRadius: 4 }}
    >
      <Stack spacing={1.25}>
        <Typography sx={{ fontSize: '1.25rem', fontWeight: 700 }}>{timer.label}</Typography>
        <StateBadge {...simplePhase(timer)} />
        <Countdown timer={timer} size="pocket" label={timer.label} />
        <ActionButtons
          actions={simpleActions(timer)}
          run={run}
          canCommand={canCommand}
          size="pocket"
          context={timer.label}
        />
      </Stack>
    </Paper>
  );
}

/**
 * The Pocket view: the same live day on a helper's phone, one column, with the next alarms on top, the loads with
 * their one button and step, the small timers, and sound and vibration for alarms.
 */
export function PocketView({ kitchen, day, auth, links }: LiveDayProps) {
  useLiveDay(day.id, auth);
  const [scheme, toggleScheme] = useBoardScheme();
  const { timers, alarms } = useDayTimers();
  useAlarmAlert(alarms.length > 0);
  const run = useRunAction(day.id);
  const confirm = useConfirmStep(day.id);
  const canCommand = kitchen.role !== 'watcher' && day.status === 'open';
  const active = [...day.loads]
    .sort((a, b) => a.number - b.number)
    .filter((l) => timersOfLoad(l.id, timers).cooling === null);
  const small = timers.filter((t) => t.loadId === null && isLive(t));

  return (
    <LiveScreen scheme={scheme} testId="pocket-view">
      <BoardBar
        title={day.title}
        backHref={links.plan}
        backLabel="Back to the day plan"
        scheme={scheme}
        onToggleScheme={toggleScheme}
        compact
      />
      <Stack spacing={1.5} sx={{ p: 1.5, maxWidth: 560, mx: 'auto' }}>
        <ConnectionBanner />
        <NextAlarms timers={timers} />
        {active.map((l) => (
          <PocketLoad
            key={l.id}
            load={l}
            batch={day.batches.find((b) => b.id === l.batchId)}
            timers={timers}
            confirm={confirm}
            run={run}
            canCommand={canCommand}
          />
        ))}
        {small.map((t) => (
          <PocketTimer key={t.id} timer={t} run={run} canCommand={canCommand} />
        ))}
        {canCommand ? (
          <Paper variant="outlined" sx={{ p: 2, borderRadius: 4 }}>
            <PresetButtons title="Start a blanch dip" presets={prepPresets()} run={run} canCommand />
          </Paper>
        ) : null}
        <CoolingSummary
          loads={day.loads}
          batches={day.batches}
          timers={timers}
          shelfHref={paths.cooling(kitchen.id, day.id)}
        />
      </Stack>
      <AlarmOverlay alarms={alarms} run={run} canCommand={canCommand} compact />
    </LiveScreen>
  );
}
