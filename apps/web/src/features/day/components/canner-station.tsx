import LocalFireDepartment from '@mui/icons-material/LocalFireDepartment';
import type { BatchView, LoadView, Timer } from '@jarday/contracts';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import type { ConfirmStep } from '../hooks/use-confirm-step';
import { jarsText, loadTitle, processFor } from '../utils/labels';
import { loadPhase, timersOfLoad } from '../utils/load-phase';
import { loadSteps, timerStepDone } from '../utils/steps';
import { loadActions, type BoardAction } from '../utils/timer-actions';
import { ActionButtons } from './action-buttons';
import { Countdown, TimerProgress } from './countdown';
import { StateBadge } from './state-badge';
import { StationCard } from './station-card';
import { StepGuide } from './step-guide';

export interface CannerGroup {
  cannerId: string;
  name: string;
  loads: LoadView[];
}

interface CannerStationProps {
  canner: CannerGroup;
  timers: Timer[];
  batches: BatchView[];
  run: (action: BoardAction) => Promise<string | null>;
  confirm: ConfirmStep;
  canCommand: boolean;
  planHref: string;
}

/** The phases in which the station shows a clock: counting ones, and the full time while it waits to start. */
const SHOWS_CLOCK = new Set(['filling', 'heating', 'venting', 'coming-up', 'processing', 'opening-wait', 'resting']);

/**
 * A canner: its load's state in words and shape, the big clock and the one button for the moment (rolling boil,
 * boil lost, heat off...), the load's step guide, and the loads queued after it.
 */
export function CannerStation({ canner, timers, batches, run, confirm, canCommand, planHref }: CannerStationProps) {
  const lifted = (l: LoadView) => timersOfLoad(l.id, timers).cooling !== null;
  const load = canner.loads.find((l) => !lifted(l));
  const queued = load ? canner.loads.filter((l) => l.number > load.number && !lifted(l)) : [];

  if (!load) {
    return (
      <StationCard
        title={canner.name}
        icon={<LocalFireDepartment fontSize="inherit" />}
        testId={`canner-${canner.cannerId}`}
      >
        <Typography sx={{ fontSize: '1.3rem' }}>Every load of this canner is out and cooling.</Typography>
        <Link component={RouterLink} to={planHref} sx={{ fontSize: '1.2rem' }}>
          Make the next load
        </Link>
      </StationCard>
    );
  }

  const own = timersOfLoad(load.id, timers);
  const phase = loadPhase(load, own);
  const batch = batches.find((b) => b.id === load.batchId);
  const clock = phase.clock && SHOWS_CLOCK.has(phase.phase) ? phase.clock : null;
  const counting = clock?.deadlineAt != null;
  const title = loadTitle(load, batch);

  return (
    <StationCard
      title={canner.name}
      subtitle={title}
      icon={<LocalFireDepartment fontSize="inherit" />}
      attention={phase.tone === 'attention'}
      testId={`canner-${canner.cannerId}`}
    >
      <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', md: 'minmax(0, 1.1fr) minmax(0, 1fr)' } }}>
        <Stack spacing={2} data-testid="load-timer" data-phase={phase.phase}>
          <StateBadge title={phase.title} shape={phase.shape} tone={phase.tone} big />
          {clock ? <Countdown timer={clock} label={title} /> : null}
          {clock && counting ? <TimerProgress timer={clock} label={title} /> : null}
          <Typography sx={{ fontSize: '1.35rem', fontWeight: 500 }}>{phase.next}</Typography>
          <Typography sx={{ color: 'text.secondary' }}>For {processFor(load)}</Typography>
          <ActionButtons
            actions={loadActions(load, own)}
            run={run}
            canCommand={canCommand}
            context={`load ${load.number}`}
          />
        </Stack>
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
      </Box>
      {queued.length > 0 ? (
        <Typography sx={{ color: 'text.secondary', fontSize: '1.1rem' }}>
          Next in this canner: {queued.map((l) => `Load ${l.number} (${batchJars(l, batches)})`).join(', ')}
        </Typography>
      ) : null}
    </StationCard>
  );
}

function batchJars(load: LoadView, batches: BatchView[]): string {
  const batch = batches.find((b) => b.id === load.batchId);
  return batch ? jarsText(load.jars, batch.jarSize) : `${load.jars} jars`;
}
