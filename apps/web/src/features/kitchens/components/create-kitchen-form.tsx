import { createKitchenSchema, type KitchenView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import type { FormEvent } from 'react';
import { useCreateKitchen } from '../api/create-kitchen';
import { useKitchenForm } from '../hooks/use-kitchen-form';
import { KitchenFields } from './kitchen-fields';

/** Starts a new kitchen; the person who starts it becomes its lead. */
export function CreateKitchenForm({ onCreated }: { onCreated: (kitchen: KitchenView) => void }) {
  const form = useKitchenForm({ name: '', altitudeValue: '', altitudeUnit: 'ft', units: 'us' }, createKitchenSchema);
  const create = useCreateKitchen({ onSuccess: onCreated });

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const body = form.check();
    if (body) create.mutate(body, { onError: form.showServerError });
  };

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5} aria-label="Start a kitchen">
      {form.general ? <Alert severity="error">{form.general}</Alert> : null}
      <KitchenFields values={form.values} errors={form.errors} onChange={form.change} />
      <Button type="submit" variant="contained" size="large" disabled={create.isPending}>
        {create.isPending ? 'Starting…' : 'Start kitchen'}
      </Button>
    </Stack>
  );
}
