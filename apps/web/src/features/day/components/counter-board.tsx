import { countCommits, countRender } from '../../../lib/render-counter';
import Countertops from '@mui/icons-material/Countertops';
import Inventory2 from '@mui/icons-material/Inventory2';
import MenuBook from '@mui/icons-material/MenuBook';
import OutdoorGrill from '@mui/icons-material/OutdoorGrill';
import type { DayView, LoadView, PrepStep, Role } from '@jarday/contracts';
import { CAUTIONS } from '@jarday/rules';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { lazy, Profiler, Suspense, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../../config/paths';
import type { LiveAuth } from '../../../lib/socket';
import { useAlarmAlert } from '../hooks/use-alarm-alert';
import { useBoardScheme } from '../hooks/use-board-scheme';
import { useConfirmStep } from '../hooks/use-confirm-step';
import { useDayTimers } from '../hooks/use-day-timers';
import { useLiveDay } from '../hooks/use-live-day';
import { useRunAction } from '../hooks/use-run-action';
import { useWakeLock } from '../hooks/use-wake-lock';
import { jarPresets, prepPresets, stovePresets } from '../utils/presets';
import { batchSteps } from '../utils/steps';
import { AlarmOverlay } from './alarm-overlay';
import { BoardBar } from './board-bar';
import { CannerStation, type CannerGroup } from './canner-station';
import { ConnectionBanner } from './connection-banner';
import { LiveScreen } from './live-screen';
import { CoolingSummary } from './cooling-summary';
import { StationCard } from './station-card';
import { StepGuide } from './step-guide';
import { TimerStation } from './timer-station';

// Opened on demand: its fields and the QR encoder stay out of the board's first load.
const PhoneJoinPanel = lazy(() => import('./phone-join-panel').then((m) => ({ default: m.PhoneJoinPanel })));

export interface LiveDayProps {
  kitchen: { id: string; name: string; role: Role };
  day: DayView;
  /** The kitchen's recipes, for their prep steps; the board works without them. */
  recipes?: readonly { id: string; prepSteps: PrepStep[] }[];
  auth: LiveAuth;
  links: { plan: string; pocket: string };
}

/** The day's loads by canner, in load order. */
export function cannerGroups(loads: readonly LoadView[]): CannerGroup[] {
  const groups = new Map<string, CannerGroup>();
  for (const load of [...loads].sort((a, b) => a.number - b.number)) {
    const id = load.cannerId ?? `gone-${load.cannerName}`;
    const group = groups.get(id) ?? { cannerId: id, name: load.cannerName, loads: [] };
    group.loads.push(load);
    groups.set(id, group);
  }
  return [...groups.values()];
}

/**
 * The Counter board: a tablet's view of the whole day, stations side by side. Canners on the wide side with their
 * loads and step guides; prep, stove, jars and the cooling shelf beside them. Alarms take the whole screen.
 */
export function CounterBoard({ kitchen, day, recipes, auth, links }: LiveDayProps) {
  countRender('CounterBoard');
  useLiveDay(day.id, auth);
  const wakeLock = useWakeLock();
  const [scheme, toggleScheme] = useBoardScheme();
  const [phones, setPhones] = useState(false);
  const { timers, alarms } = useDayTimers();
  useAlarmAlert(alarms.length > 0);
  const run = useRunAction(day.id);
  const confirm = useConfirmStep(day.id);
  const canCommand = kitchen.role !== 'watcher' && day.status === 'open';
  const prepSteps = (recipeId: string) => recipes?.find((r) => r.id === recipeId)?.prepSteps;
  const common = { run, canCommand };

  return (
    <Profiler id="board" onRender={countCommits}>
      <LiveScreen scheme={scheme} testId="counter-board">
        <BoardBar
          title={day.title}
          backHref={links.plan}
          backLabel="Back to the day plan"
          scheme={scheme}
          onToggleScheme={toggleScheme}
          wakeLock={wakeLock}
          onPhone={() => setPhones((p) => !p)}
          phoneOpen={phones}
        />
        <Stack spacing={2} sx={{ p: { xs: 1.5, md: 2 } }}>
          <ConnectionBanner />
          {day.status === 'closed' ? (
            <Typography sx={{ fontSize: '1.2rem' }}>This day is closed: the board is read-only.</Typography>
          ) : null}
          {phones ? (
            <Suspense fallback={null}>
              <PhoneJoinPanel
                kitchenId={kitchen.id}
                kitchenName={kitchen.name}
                dayTitle={day.title}
                pocketPath={links.pocket}
                isLead={kitchen.role === 'lead'}
              />
            </Suspense>
          ) : null}
          <Box
            sx={{
              display: 'grid',
              gap: 2,
              gridTemplateColumns: { xs: '1fr', md: 'minmax(0, 2fr) minmax(0, 1fr)' },
              alignItems: 'start',
            }}
          >
            <Stack spacing={2}>
              {day.loads.length === 0 ? (
                <StationCard title="Canners" icon={<OutdoorGrill fontSize="inherit" />}>
                  <Typography sx={{ fontSize: '1.3rem' }}>No loads yet.</Typography>
                  <Link component={RouterLink} to={links.plan} sx={{ fontSize: '1.2rem' }}>
                    Make a load on the day plan
                  </Link>
                </StationCard>
              ) : (
                cannerGroups(day.loads).map((c) => (
                  <CannerStation
                    key={c.cannerId}
                    canner={c}
                    timers={timers}
                    batches={day.batches}
                    planHref={links.plan}
                    confirm={confirm}
                    {...common}
                  />
                ))
              )}
              {day.batches.length > 0 ? (
                <StationCard
                  title="Batches"
                  icon={<MenuBook fontSize="inherit" />}
                  subtitle="Prep steps, batch by batch"
                >
                  {day.batches.map((b) => (
                    <Box key={b.id} sx={{ borderTop: 1, borderColor: 'divider', pt: 2 }}>
                      <Typography sx={{ fontSize: '1.3rem', fontWeight: 700, mb: 1 }}>{b.recipeName}</Typography>
                      <StepGuide
                        name={b.recipeName}
                        steps={batchSteps(b, prepSteps(b.recipeId), day.loads.find((l) => l.batchId === b.id)?.plan)}
                        who={{ subject: 'batch', id: b.id }}
                        confirm={confirm}
                        canCommand={canCommand}
                        compact
                      />
                    </Box>
                  ))}
                </StationCard>
              ) : null}
            </Stack>
            <Stack spacing={2}>
              <TimerStation
                title="Prep"
                icon={<Countertops fontSize="inherit" />}
                timers={timers.filter((t) => t.kind === 'blanch' || t.kind === 'custom')}
                presets={prepPresets()}
                presetsTitle="Start a blanch dip"
                empty="Blanch dips for peeling: 30 to 60 seconds."
                testId="station-prep"
                {...common}
              />
              <TimerStation
                title="Stove"
                icon={<OutdoorGrill fontSize="inherit" />}
                timers={timers.filter((t) => t.kind === 'simmer')}
                presets={stovePresets(day.batches.flatMap((b) => prepSteps(b.recipeId) ?? []))}
                presetsTitle="Start a simmer"
                empty="Nothing simmering."
                testId="station-stove"
                {...common}
              />
              <TimerStation
                title="Jars"
                icon={<Inventory2 fontSize="inherit" />}
                timers={timers.filter((t) => t.kind === 'hot-hold')}
                presets={jarPresets(day.loads)}
                presetsTitle="Time the jars"
                empty="Keep clean jars hot in simmering water until you fill them."
                testId="station-jars"
                {...common}
              />
              <CoolingSummary
                loads={day.loads}
                batches={day.batches}
                timers={timers}
                shelfHref={paths.cooling(kitchen.id, day.id)}
              />
            </Stack>
          </Box>
          <Typography sx={{ color: 'text.secondary', fontSize: '1rem' }}>
            {CAUTIONS['hot-jars-steam'].title}. {CAUTIONS['local-guidance'].text}
          </Typography>
        </Stack>
        <AlarmOverlay alarms={alarms} {...common} />
      </LiveScreen>
    </Profiler>
  );
}
