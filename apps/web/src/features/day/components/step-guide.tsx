import CheckCircle from '@mui/icons-material/CheckCircle';
import RadioButtonUnchecked from '@mui/icons-material/RadioButtonUnchecked';
import { CAUTIONS, type Headspace } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { StepKey, StepMark } from '@jarday/contracts';
import { useState } from 'react';
import type { ConfirmStep, StepSubject } from '../hooks/use-confirm-step';
import { useLiveStore } from '../stores/live-store';
import { markKey } from '../utils/live-state';
import type { GuideStep } from '../utils/steps';
import { HeadspacePicture } from './headspace-picture';

interface StepGuideProps {
  /** Whose steps: "Load 1" or the recipe name, for headings and button names. */
  name: string;
  steps: GuideStep[];
  who: StepSubject;
  confirm: ConfirmStep;
  /** Whether a timer step is behind us (from the server's timers). */
  timerDone?: (stepId: GuideStep['id']) => boolean;
  headspace?: Headspace;
  canCommand: boolean;
  compact?: boolean;
}

/** Which steps are done: ticked ones, finished timer steps, and anything before the last finished timer step. */
export function stepsDone(
  steps: GuideStep[],
  ticked: (id: GuideStep['id']) => boolean,
  timerDone: (id: GuideStep['id']) => boolean,
): boolean[] {
  const own = steps.map((s) => (s.source === 'local' ? ticked(s.id) : timerDone(s.id)));
  const lastTimer = steps.reduce((last, s, i) => (s.source === 'timer' && own[i] ? i : last), -1);
  return own.map((done, i) => done || i < lastTimer);
}

/**
 * The step guide in large type: the step at hand with its caution (and the headspace picture when filling), a big
 * "Next step" that ticks it for every device (and the journal), and every step of the list a tap away.
 */
export function StepGuide({
  name,
  steps,
  who,
  confirm,
  timerDone = () => false,
  headspace,
  canCommand,
  compact = false,
}: StepGuideProps) {
  const marks = useLiveStore((s) => s.marks);
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const markOf = (id: GuideStep['id']): StepMark | undefined =>
    marks[markKey({ subject: who.subject, subjectId: who.id, step: id as StepKey })];
  const done = stepsDone(steps, (id) => markOf(id)?.done === true, timerDone);
  const index = done.indexOf(false);
  const step = index >= 0 ? steps[index] : undefined;
  const caution = step?.caution ? CAUTIONS[step.caution] : undefined;
  // "Back a step" unticks the latest tick of this batch or load.
  const last = steps
    .filter((s) => s.source === 'local' && markOf(s.id)?.done)
    .sort((a, b) => (markOf(b.id)?.at ?? 0) - (markOf(a.id)?.at ?? 0))[0];
  const tick = async (id: GuideStep['id'], value: boolean) => {
    setBusy(true);
    setError(await confirm(who, id as StepKey, value));
    setBusy(false);
  };

  return (
    <Stack spacing={1.5} component="section" aria-label={`Steps: ${name}`}>
      {step ? (
        <>
          <Typography variant="overline" sx={{ fontSize: '0.95rem', lineHeight: 1.2, color: 'text.secondary' }}>
            Step {index + 1} of {steps.length}
          </Typography>
          <Typography
            component="p"
            data-testid="current-step"
            sx={{ fontSize: compact ? '1.5rem' : '2rem', fontWeight: 700, lineHeight: 1.15 }}
          >
            {step.title}
          </Typography>
          <Typography sx={{ fontSize: compact ? '1.1rem' : '1.3rem' }}>{step.detail}</Typography>
          {step.picture === 'headspace' && headspace ? <HeadspacePicture headspace={headspace} /> : null}
          {caution ? (
            <Alert severity="warning" role="note" sx={{ fontSize: '1.05rem' }}>
              <AlertTitle sx={{ fontWeight: 700 }}>{caution.title}</AlertTitle>
              {caution.text}
            </Alert>
          ) : null}
          {canCommand && step.source === 'local' ? (
            <Button
              variant="contained"
              size="large"
              disabled={busy}
              onClick={() => void tick(step.id, true)}
              aria-label={`Next step: ${name}`}
              sx={{ minHeight: 72, fontSize: '1.4rem', fontWeight: 700 }}
            >
              Next step
            </Button>
          ) : null}
          {step.source === 'timer' ? (
            <Typography sx={{ color: 'text.secondary' }}>This step moves on with the canner’s buttons.</Typography>
          ) : null}
        </>
      ) : (
        <Typography sx={{ fontSize: '1.5rem', fontWeight: 700 }}>All steps done.</Typography>
      )}
      <Stack direction="row" spacing={1}>
        <Button
          variant="outlined"
          color="inherit"
          onClick={() => setOpen((o) => !o)}
          aria-expanded={open}
          sx={{ minHeight: 64, flex: 1, whiteSpace: 'nowrap' }}
        >
          {open ? 'Hide steps' : 'All steps'}
        </Button>
        {canCommand && last ? (
          <Button
            variant="outlined"
            color="inherit"
            disabled={busy}
            onClick={() => void tick(last.id, false)}
            sx={{ minHeight: 64, flex: 1, whiteSpace: 'nowrap' }}
          >
            Back a step
          </Button>
        ) : null}
      </Stack>
      {error ? (
        <Alert severity="error" onClose={() => setError(null)}>
          {error}
        </Alert>
      ) : null}
      {open ? (
        <Box component="ol" sx={{ m: 0, pl: 0, listStyle: 'none' }}>
          {steps.map((s, i) => (
            <Box
              component="li"
              key={s.id}
              sx={{
                display: 'flex',
                gap: 1,
                alignItems: 'center',
                py: 0.75,
                fontSize: '1.2rem',
                fontWeight: i === index ? 700 : 400,
              }}
            >
              {done[i] ? (
                <CheckCircle color="primary" aria-hidden />
              ) : (
                <RadioButtonUnchecked aria-hidden sx={{ color: 'text.secondary' }} />
              )}
              <span>
                {i + 1}. {s.title}
                <Box
                  component="span"
                  sx={{ position: 'absolute', width: 1, height: 1, overflow: 'hidden', clip: 'rect(0 0 0 0)' }}
                >
                  {done[i] ? ' (done)' : i === index ? ' (now)' : ''}
                </Box>
              </span>
            </Box>
          ))}
        </Box>
      ) : null}
    </Stack>
  );
}
