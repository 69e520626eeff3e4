import { createCannerSchema, type CannerView } from '@jarday/contracts';
import { CANNING_METHODS, GAUGE_TYPES, JAR_SIZES, type CanningMethod, type GaugeType } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState, type FormEvent } from 'react';
import { ChoiceField } from '../../../components/ui/choice-field';
import { numberOrUndefined, splitServerError, validate, type FieldErrors } from '../../../lib/form-errors';
import { useCreateCanner } from '../api/create-canner';
import { useUpdateCanner } from '../api/update-canner';
import { GAUGE_LABELS, METHOD_LABELS } from '../utils/canner-labels';
import { CapacityFields, type CapacityText } from './capacity-fields';
import { DialGaugeCaution } from './dial-gauge-caution';
import { HeatingFields } from './heating-fields';

interface CannerFormProps {
  kitchenId: string;
  /** Given when editing; the form then replaces the canner whole (PUT). */
  canner?: CannerView;
  onSaved: (canner: CannerView) => void;
  onCancel?: () => void;
}

interface Values {
  name: string;
  method: CanningMethod;
  gauge: GaugeType | '';
  capacity: CapacityText;
  waterLitres: string;
  burnerWatts: string;
}

const initialValues = (canner?: CannerView): Values => ({
  name: canner?.name ?? '',
  method: canner?.method ?? 'boiling-water',
  gauge: canner?.gauge ?? '',
  capacity: Object.fromEntries(
    JAR_SIZES.map((size) => [size, canner?.capacity[size] === undefined ? '' : String(canner.capacity[size])]),
  ) as CapacityText,
  waterLitres: canner?.waterLitres == null ? '' : String(canner.waterLitres),
  burnerWatts: canner?.burnerWatts == null ? '' : String(canner.burnerWatts),
});

/** A boiling-water canner has no gauge, so none is sent; empty jar sizes are left out of the capacity. */
const toInput = (v: Values) => ({
  name: v.name,
  method: v.method,
  gauge: v.method === 'pressure' && v.gauge !== '' ? v.gauge : null,
  capacity: Object.fromEntries(
    JAR_SIZES.filter((size) => v.capacity[size].trim() !== '').map((size) => [
      size,
      numberOrUndefined(v.capacity[size]),
    ]),
  ),
  // Left empty, they are null: the planner then uses the canner's logged days or the published come-up.
  waterLitres: numberOrUndefined(v.waterLitres) ?? null,
  burnerWatts: numberOrUndefined(v.burnerWatts) ?? null,
});

/** Adds or edits a canner: name, method, gauge (pressure only) and how many jars of each size fit. */
export function CannerForm({ kitchenId, canner, onSaved, onCancel }: CannerFormProps) {
  const [values, setValues] = useState(() => initialValues(canner));
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);
  const create = useCreateCanner(kitchenId, { onSuccess: onSaved });
  const update = useUpdateCanner(kitchenId, { onSuccess: onSaved });
  const pending = create.isPending || update.isPending;

  const change = (patch: Partial<Values>) => {
    setValues((v) => ({ ...v, ...patch }));
    setErrors({});
    setGeneral(null);
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const result = validate(createCannerSchema, toInput(values));
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    const onError = (error: unknown) => {
      const split = splitServerError(error, ['name', 'method', 'gauge', 'capacity', 'waterLitres', 'burnerWatts']);
      setErrors(split.fieldErrors);
      setGeneral(split.general);
    };
    if (canner) update.mutate({ cannerId: canner.id, input: result.data }, { onError });
    else create.mutate(result.data, { onError });
  };

  return (
    <Stack
      component="form"
      noValidate
      onSubmit={submit}
      spacing={3}
      aria-label={canner ? 'Edit canner' : 'Add a canner'}
    >
      {general ? <Alert severity="error">{general}</Alert> : null}
      <TextField
        label="Canner name"
        value={values.name}
        onChange={(e) => change({ name: e.target.value })}
        error={Boolean(errors.name)}
        helperText={errors.name ?? 'A name everyone in the kitchen recognises, e.g. "Big blue pot".'}
        slotProps={{ htmlInput: { autoComplete: 'off' } }}
      />
      <ChoiceField
        label="Method"
        value={values.method}
        options={CANNING_METHODS.map((m) => ({ value: m, label: METHOD_LABELS[m] }))}
        onChange={(method) => change({ method })}
        error={errors.method}
        hint="Low-acid foods (vegetables, meat, poultry, fish) need a pressure canner."
      />
      {values.method === 'pressure' ? (
        <ChoiceField
          label="Gauge"
          value={values.gauge}
          options={GAUGE_TYPES.map((g) => ({ value: g, label: GAUGE_LABELS[g] }))}
          onChange={(gauge) => change({ gauge })}
          error={errors.gauge}
        />
      ) : null}
      {values.method === 'pressure' && values.gauge === 'dial' ? <DialGaugeCaution /> : null}
      <CapacityFields
        value={values.capacity}
        errors={errors}
        onChange={(size, text) => change({ capacity: { ...values.capacity, [size]: text } })}
      />
      <HeatingFields
        waterLitres={values.waterLitres}
        burnerWatts={values.burnerWatts}
        errors={errors}
        onChange={(patch) => change(patch)}
      />
      <Stack direction="row" spacing={1.5} sx={{ justifyContent: 'flex-end' }}>
        {onCancel ? <Button onClick={onCancel}>Cancel</Button> : null}
        <Button type="submit" variant="contained" disabled={pending}>
          {pending ? 'Saving…' : canner ? 'Save canner' : 'Add canner'}
        </Button>
      </Stack>
    </Stack>
  );
}
