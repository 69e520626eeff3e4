import { createLoadSchema, type BatchView, type CannerView, type LoadView } from '@jarday/contracts';
import { JAR_SIZE_LABELS } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState, type FormEvent } from 'react';
import { numberOrUndefined, splitServerError, validate, type FieldErrors } from '../../../lib/form-errors';
import { useAddLoad } from '../api/add-load';

interface LoadFormProps {
  kitchenId: string;
  dayId: string;
  batches: readonly BatchView[];
  loads: readonly LoadView[];
  canners: readonly CannerView[];
}

/** Jars of the batch not yet in a load. */
export function jarsLeft(batch: BatchView, loads: readonly LoadView[]): number {
  return Math.max(0, batch.jars - loads.filter((l) => l.batchId === batch.id).reduce((n, l) => n + l.jars, 0));
}

/**
 * Jars of one batch into one canner. The server plans it (the tested time at the day's altitude in that canner) and
 * makes its process timer, or refuses with the reason, which is shown as it comes.
 */
export function LoadForm({ kitchenId, dayId, batches, loads, canners }: LoadFormProps) {
  const [batchId, setBatchId] = useState(batches.find((b) => jarsLeft(b, loads) > 0)?.id ?? batches[0]?.id ?? '');
  const [cannerId, setCannerId] = useState(canners[0]?.id ?? '');
  const [jars, setJars] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [refusal, setRefusal] = useState<string | null>(null);
  const add = useAddLoad(kitchenId, dayId, { onSuccess: () => setJars('') });
  const batch = batches.find((b) => b.id === batchId);
  const canner = canners.find((c) => c.id === cannerId);
  const capacity = batch && canner ? (canner.capacity[batch.jarSize] ?? 0) : 0;
  const suggested = batch ? Math.min(capacity, jarsLeft(batch, loads)) : 0;
  const size = batch ? JAR_SIZE_LABELS[batch.jarSize].toLowerCase() : '';
  const holds =
    canner && batch
      ? capacity > 0
        ? `Holds ${capacity} ${size} jars at a time.`
        : `Not set up for ${size} jars.`
      : undefined;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const checked = validate(createLoadSchema, {
      batchId,
      cannerId,
      jars: numberOrUndefined(jars) ?? (suggested || undefined),
    });
    if (!checked.ok) return setErrors(checked.errors);
    setErrors({});
    setRefusal(null);
    add.mutate(checked.data, {
      onError: (error) => {
        const split = splitServerError(error, ['jars']);
        setErrors(split.fieldErrors);
        setRefusal(split.general);
      },
    });
  };

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2} aria-label="Make a load">
      <Typography variant="h3">Make a load</Typography>
      {refusal ? (
        <Alert severity="error" role="alert" data-testid="load-refusal">
          {refusal}
        </Alert>
      ) : null}
      <TextField
        select
        label="Batch"
        value={batchId}
        onChange={(e) => setBatchId(e.target.value)}
        error={Boolean(errors.batchId)}
        helperText={errors.batchId}
      >
        {batches.map((b) => (
          <MenuItem key={b.id} value={b.id}>
            {b.recipeName}: {jarsLeft(b, loads)} of {b.jars} {JAR_SIZE_LABELS[b.jarSize].toLowerCase()} jars still to
            load
          </MenuItem>
        ))}
      </TextField>
      <TextField
        select
        label="Canner"
        value={cannerId}
        onChange={(e) => setCannerId(e.target.value)}
        error={Boolean(errors.cannerId)}
        helperText={errors.cannerId ?? holds}
      >
        {canners.map((c) => (
          <MenuItem key={c.id} value={c.id}>
            {c.name} ({c.method === 'pressure' ? 'pressure' : 'boiling water'})
          </MenuItem>
        ))}
      </TextField>
      <TextField
        label="Jars in this load"
        value={jars}
        placeholder={suggested > 0 ? String(suggested) : undefined}
        onChange={(e) => setJars(e.target.value)}
        error={Boolean(errors.jars)}
        helperText={errors.jars ?? (suggested > 0 ? `Leave empty for ${suggested}.` : undefined)}
        slotProps={{ htmlInput: { inputMode: 'numeric' } }}
      />
      <Button
        type="submit"
        variant="contained"
        disabled={add.isPending || !batch || !canner}
        sx={{ alignSelf: 'flex-start' }}
      >
        {add.isPending ? 'Planning…' : 'Make load'}
      </Button>
    </Stack>
  );
}
