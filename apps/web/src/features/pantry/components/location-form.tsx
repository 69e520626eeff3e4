import { updateLotSchema, type LotView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState, type FormEvent } from 'react';
import { splitServerError, validate } from '../../../lib/form-errors';
import { useUpdateLot } from '../api/update-lot';

/** Where the lot's jars are kept ("cellar shelf 2"); an empty field clears it. */
export function LocationForm({ kitchenId, lot }: { kitchenId: string; lot: LotView }) {
  const [location, setLocation] = useState(lot.location ?? '');
  const [error, setError] = useState<string | undefined>();
  const [general, setGeneral] = useState<string | null>(null);
  const update = useUpdateLot(kitchenId, lot.id);
  const changed = location.trim() !== (lot.location ?? '');

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setGeneral(null);
    const checked = validate(updateLotSchema, { location: location.trim() ? location : null });
    if (!checked.ok) return setError(checked.errors.location);
    setError(undefined);
    update.mutate(checked.data, {
      onError: (e) => {
        const split = splitServerError(e, ['location']);
        setError(split.fieldErrors.location);
        setGeneral(split.general);
      },
    });
  };

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={1.5} aria-label="Where the jars are kept">
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5} sx={{ alignItems: { sm: 'flex-start' } }}>
        <TextField
          label="Where the jars are kept"
          value={location}
          onChange={(e) => setLocation(e.target.value)}
          error={Boolean(error)}
          helperText={error ?? (update.isSuccess && !changed ? 'Saved.' : 'A cool, dark, dry place.')}
        />
        <Button type="submit" variant="outlined" disabled={!changed || update.isPending} sx={{ flexShrink: 0 }}>
          {update.isPending ? 'Saving…' : 'Save place'}
        </Button>
      </Stack>
      {general ? (
        <Alert severity="error" role="alert">
          {general}
        </Alert>
      ) : null}
    </Stack>
  );
}
