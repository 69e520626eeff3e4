import type { AltitudeUnit, UnitSystem } from '@jarday/rules';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { numberOrUndefined, type FieldErrors } from '../../../lib/form-errors';
import { AltitudeField } from './altitude-field';
import { UnitsField } from './units-field';

/** What the kitchen form holds while someone types: text, not yet numbers. */
export interface KitchenFormValues {
  name: string;
  altitudeValue: string;
  altitudeUnit: AltitudeUnit;
  units: UnitSystem;
}

export const KITCHEN_FIELDS = ['name', 'altitude', 'units'] as const;

/** The request body the shared schema checks. */
export function toKitchenInput(values: KitchenFormValues) {
  return {
    name: values.name,
    altitude: { value: numberOrUndefined(values.altitudeValue), unit: values.altitudeUnit },
    units: values.units,
  };
}

/** Name, altitude and units: the fields shared by "start a kitchen" and the kitchen's settings. */
export function KitchenFields({
  values,
  errors,
  onChange,
}: {
  values: KitchenFormValues;
  errors: FieldErrors;
  onChange: (patch: Partial<KitchenFormValues>) => void;
}) {
  return (
    <Stack spacing={2.5}>
      <TextField
        label="Kitchen name"
        value={values.name}
        onChange={(e) => onChange({ name: e.target.value })}
        error={Boolean(errors.name)}
        helperText={errors.name}
        slotProps={{ htmlInput: { autoComplete: 'off' } }}
      />
      <AltitudeField
        value={values.altitudeValue}
        unit={values.altitudeUnit}
        onValueChange={(altitudeValue) => onChange({ altitudeValue })}
        onUnitChange={(altitudeUnit) => onChange({ altitudeUnit })}
        error={errors['altitude.value'] ?? errors['altitude.unit'] ?? errors.altitude}
      />
      <UnitsField value={values.units} onChange={(units) => onChange({ units })} error={errors.units} />
    </Stack>
  );
}
