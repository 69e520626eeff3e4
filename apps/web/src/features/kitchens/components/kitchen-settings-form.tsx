import { updateKitchenSchema, type KitchenView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useState, type FormEvent } from 'react';
import { useUpdateKitchen } from '../api/update-kitchen';
import { useKitchenForm } from '../hooks/use-kitchen-form';
import { KitchenFields } from './kitchen-fields';

/** The lead's form for the kitchen's name, altitude and units. */
export function KitchenSettingsForm({ kitchen }: { kitchen: KitchenView }) {
  const form = useKitchenForm(
    {
      name: kitchen.name,
      altitudeValue: String(kitchen.altitude.value),
      altitudeUnit: kitchen.altitude.unit,
      units: kitchen.units,
    },
    updateKitchenSchema,
  );
  const [saved, setSaved] = useState(false);
  const update = useUpdateKitchen(kitchen.id, { onSuccess: () => setSaved(true) });

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setSaved(false);
    const body = form.check();
    if (body) update.mutate(body, { onError: form.showServerError });
  };

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5} aria-label="Kitchen settings">
      {form.general ? <Alert severity="error">{form.general}</Alert> : null}
      {saved ? (
        <Alert severity="success" role="status">
          Settings saved.
        </Alert>
      ) : null}
      <KitchenFields
        values={form.values}
        errors={form.errors}
        onChange={(patch) => {
          setSaved(false);
          form.change(patch);
        }}
      />
      <Button
        type="submit"
        variant="contained"
        size="large"
        disabled={update.isPending}
        sx={{ alignSelf: 'flex-start' }}
      >
        {update.isPending ? 'Saving…' : 'Save settings'}
      </Button>
    </Stack>
  );
}
