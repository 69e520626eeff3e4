import { createDaySchema, type DayView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState, type FormEvent } from 'react';
import { splitServerError, validate, type FieldErrors } from '../../../lib/form-errors';
import { useCreateDay } from '../api/create-day';

/** Today in the kitchen's (this device's) calendar, as YYYY-MM-DD. */
export function localDate(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** A new canning day: its date and a name. Batches and loads come next, on the day's plan. */
export function StartDayForm({ kitchenId, onCreated }: { kitchenId: string; onCreated: (day: DayView) => void }) {
  const [date, setDate] = useState(localDate);
  const [title, setTitle] = useState('Canning day');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);
  const create = useCreateDay(kitchenId, { onSuccess: onCreated });

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const checked = validate(createDaySchema, { date, title });
    if (!checked.ok) return setErrors(checked.errors);
    setErrors({});
    setGeneral(null);
    create.mutate(checked.data, {
      onError: (error) => {
        const split = splitServerError(error, ['date', 'title']);
        setErrors(split.fieldErrors);
        setGeneral(split.general);
      },
    });
  };

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5} aria-label="Start a canning day">
      {general ? <Alert severity="error">{general}</Alert> : null}
      <TextField
        label="Date"
        type="date"
        value={date}
        onChange={(e) => setDate(e.target.value)}
        error={Boolean(errors.date)}
        helperText={errors.date}
        slotProps={{ inputLabel: { shrink: true } }}
      />
      <TextField
        label="Name of the day"
        value={title}
        onChange={(e) => setTitle(e.target.value)}
        error={Boolean(errors.title)}
        helperText={errors.title ?? 'For example "Tomatoes with Teo".'}
      />
      <Button type="submit" variant="contained" size="large" disabled={create.isPending}>
        {create.isPending ? 'Starting…' : 'Start the day'}
      </Button>
    </Stack>
  );
}
