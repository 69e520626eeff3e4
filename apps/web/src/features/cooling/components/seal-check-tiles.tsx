import {
  OUTCOMES_BY_RESULT,
  sealCheckSchema,
  type CoolingLoadView,
  type JarOutcome,
  type SealResult,
} from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { validate } from '../../../lib/form-errors';
import { useSaveSealChecks } from '../api/save-seal-checks';
import { nextSeal } from '../utils/seal-labels';
import { JarTile } from './jar-tile';
import { UnsealedCaution, UnsealedChoice } from './unsealed-choice';

interface Mark {
  result: SealResult;
  outcome: JarOutcome | null;
}

interface SealCheckTilesProps {
  kitchenId: string;
  load: CoolingLoadView;
  /** Whether an unsealed jar may still be reprocessed (within 24 hours of lifting). */
  reprocessOpen: boolean;
  canCheck: boolean;
  onSaved?: () => void;
}

/** Sealed jars are stored and broken ones discarded; only a jar that did not seal needs a choice. */
function outcomeFor(result: SealResult, reprocessOpen: boolean, before: JarOutcome | null): JarOutcome | null {
  const allowed = OUTCOMES_BY_RESULT[result].filter((o) => reprocessOpen || o !== 'reprocess');
  if (before && allowed.includes(before)) return before;
  return allowed.length === 1 ? (allowed[0] ?? null) : null;
}

/**
 * The seal check of one load: a tile per jar, tapped through sealed, not sealed and broken. A jar that did not seal
 * goes to the fridge or is reprocessed with a new lid; the choice is asked for each such jar before saving.
 */
export function SealCheckTiles({ kitchenId, load, reprocessOpen, canCheck, onSaved }: SealCheckTilesProps) {
  const [marks, setMarks] = useState<Record<number, Mark>>(() =>
    Object.fromEntries(load.sealChecks.map((c) => [c.jarNumber, { result: c.result, outcome: c.outcome }])),
  );
  const [missing, setMissing] = useState<number[]>([]);
  const [formError, setFormError] = useState<string | null>(null);
  const save = useSaveSealChecks(kitchenId, load.loadId, { onSuccess: onSaved });
  const numbers = Array.from({ length: load.jars }, (_, i) => i + 1);
  const unsealed = numbers.filter((n) => marks[n]?.result === 'unsealed');
  const unchecked = numbers.filter((n) => !marks[n]);
  const checkedCount = load.jars - unchecked.length;
  const saved = load.sealChecks
    .map((c) => `${c.jarNumber}${c.result}${c.outcome}`)
    .sort()
    .join();
  const now = numbers
    .flatMap((n) => (marks[n] ? [`${n}${marks[n].result}${marks[n].outcome ?? ''}`] : []))
    .sort()
    .join();
  const changed = saved !== now;

  const setMark = (jar: number, mark: Mark) => {
    setMarks((m) => ({ ...m, [jar]: mark }));
    setMissing((list) => list.filter((n) => n !== jar));
  };
  const tap = (jar: number) => {
    const result = nextSeal(marks[jar]?.result ?? null);
    setMark(jar, { result, outcome: outcomeFor(result, reprocessOpen, marks[jar]?.outcome ?? null) });
  };
  const restSealed = () =>
    setMarks((m) => ({
      ...m,
      ...Object.fromEntries(unchecked.map((n) => [n, { result: 'sealed', outcome: 'store' } satisfies Mark])),
    }));

  const submit = () => {
    setFormError(null);
    const undecided = unsealed.filter((n) => !marks[n]?.outcome);
    setMissing(undecided);
    if (undecided.length) return;
    const jars = numbers.flatMap((n) => {
      const mark = marks[n];
      return mark?.outcome ? [{ jarNumber: n, result: mark.result, outcome: mark.outcome }] : [];
    });
    const checked = validate(sealCheckSchema, { jars });
    if (!checked.ok) return setFormError(Object.values(checked.errors)[0] ?? 'Check the jars again.');
    save.mutate(checked.data, { onError: (error) => setFormError(error.message) });
  };

  return (
    <Stack spacing={2} component="section" aria-label={`Seal check, load ${load.number}`}>
      <Typography sx={{ fontSize: '1.1rem' }}>
        Press the middle of each lid: a sealed lid does not flex. Tap a jar once for sealed, twice for not sealed, three
        times for broken.
      </Typography>
      <Box sx={{ display: 'grid', gap: 1.5, gridTemplateColumns: 'repeat(auto-fill, minmax(104px, 1fr))' }}>
        {numbers.map((n) => (
          <JarTile key={n} jarNumber={n} result={marks[n]?.result ?? null} disabled={!canCheck} onTap={() => tap(n)} />
        ))}
      </Box>
      {canCheck && unchecked.length > 0 && checkedCount > 0 ? (
        <Button variant="outlined" onClick={restSealed} sx={{ alignSelf: 'flex-start', minHeight: 64 }}>
          The other {unchecked.length} sealed
        </Button>
      ) : null}
      {unsealed.map((n) => (
        <UnsealedChoice
          key={n}
          jarNumber={n}
          value={marks[n]?.outcome ?? null}
          reprocessOpen={reprocessOpen}
          missing={missing.includes(n)}
          disabled={!canCheck}
          onChange={(outcome) => setMark(n, { result: 'unsealed', outcome })}
        />
      ))}
      {unsealed.length > 0 ? <UnsealedCaution /> : null}
      {formError ? (
        <Alert severity="error" role="alert">
          {formError}
        </Alert>
      ) : null}
      {canCheck ? (
        <Button
          variant="contained"
          onClick={submit}
          disabled={save.isPending || checkedCount === 0 || !changed}
          sx={{ alignSelf: 'flex-start', minHeight: 64, fontSize: '1.2rem' }}
        >
          {save.isPending
            ? 'Saving…'
            : changed
              ? `Save seal checks (${checkedCount} of ${load.jars} jars)`
              : `Saved: ${checkedCount} of ${load.jars} jars checked`}
        </Button>
      ) : null}
    </Stack>
  );
}
