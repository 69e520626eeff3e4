import type { PlanAnswer } from '@jarday/contracts';
import { formatFeet, JAR_SIZE_LABELS, type UnitSystem } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, type ReactNode } from 'react';
import { formatTemperatureF, GAUGE_NAMES, METHOD_NAMES } from '../utils/recipe-labels';
import { UntestedBadge } from './untested-badge';

/** One labelled line of the plan; the value is an <output> named by its label, so it can be found and announced. */
function Fact({ label, children, big = false }: { label: string; children: ReactNode; big?: boolean }) {
  const id = useId();
  return (
    <Stack direction={{ xs: 'column', sm: 'row' }} sx={{ gap: { xs: 0, sm: 2 }, py: 0.75 }}>
      <Typography id={id} component="dt" sx={{ fontWeight: 500, minWidth: 190, flexShrink: 0 }}>
        {label}
      </Typography>
      <Typography
        component="dd"
        variant={big ? 'h2' : 'body1'}
        sx={{ m: 0, color: big ? 'primary.main' : 'text.primary' }}
      >
        <output aria-labelledby={id}>{children}</output>
      </Typography>
    </Stack>
  );
}

/** A planned load, or the reason there is none. */
export function PlanOutput({ answer, units }: { answer: PlanAnswer; units: UnitSystem }) {
  if (!answer.ok) {
    return (
      <Alert severity="error" role="status">
        <AlertTitle>No plan for this choice</AlertTitle>
        {answer.reason.message}
      </Alert>
    );
  }
  const { plan, cautions } = answer;
  const jar = JAR_SIZE_LABELS[plan.jarSize].toLowerCase();
  return (
    <Stack spacing={2}>
      {plan.tested ? null : <UntestedBadge />}
      <Box component="dl" sx={{ m: 0 }}>
        <Fact label="Process time" big>
          {plan.minutes} minutes
        </Fact>
        <Fact label="Method and altitude">
          {METHOD_NAMES[plan.method]} at {formatFeet(plan.altitudeFt)} ft ({plan.band.label} band)
        </Fact>
        {plan.pressure ? (
          <Fact label="Gauge pressure">
            {plan.pressure.pounds} lb on a {GAUGE_NAMES[plan.pressure.gauge]}
          </Fact>
        ) : null}
        {plan.ventMinutes !== null ? (
          <Fact label="Vent first">Let steam escape for {plan.ventMinutes} minutes before closing the vent</Fact>
        ) : null}
        {plan.water ? (
          <Fact label="Water bath">
            At least {plan.water.overJarsInches} inch over the jar tops, preheated to{' '}
            {formatTemperatureF(plan.water.preheatF, units)}
          </Fact>
        ) : null}
        <Fact label="Timing">{plan.timing.text}</Fact>
        <Fact label="Jar preparation">{plan.jarPreparation.text}</Fact>
        <Fact label="Headspace to leave">{plan.headspace.label}</Fact>
        {plan.acidPerJar.length > 0 ? (
          <Fact label="Acid per jar">{plan.acidPerJar.map((a) => a.text).join(', or ')}</Fact>
        ) : null}
        <Fact label="After processing">{plan.afterProcess.text}</Fact>
        <Fact label="Jars per load">
          {plan.jarsPerLoad} {jar} jars
        </Fact>
      </Box>
      <Alert severity="warning" role="note">
        <AlertTitle>Cautions</AlertTitle>
        <Box component="ul" sx={{ m: 0, pl: 2.5, display: 'grid', gap: 1 }}>
          {cautions.map((c) => (
            <li key={c.id}>
              <strong>{c.title}.</strong> {c.text}
            </li>
          ))}
        </Box>
      </Alert>
    </Stack>
  );
}
