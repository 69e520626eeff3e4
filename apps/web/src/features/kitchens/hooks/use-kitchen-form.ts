import { useState } from 'react';
import type { z } from 'zod';
import { splitServerError, validate, type FieldErrors } from '../../../lib/form-errors';
import { KITCHEN_FIELDS, toKitchenInput, type KitchenFormValues } from '../components/kitchen-fields';

/**
 * Form state shared by "start a kitchen" and the settings form: validates with the given contract
 * schema, then hands the parsed body to `send`, mapping the server's field issues back onto fields.
 */
export function useKitchenForm<S extends z.ZodType>(initial: KitchenFormValues, schema: S) {
  const [values, setValues] = useState(initial);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);

  const change = (patch: Partial<KitchenFormValues>) => {
    setValues((v) => ({ ...v, ...patch }));
    setErrors({});
    setGeneral(null);
  };

  /** Returns the checked body, or null after showing the schema's messages. */
  const check = (): z.output<S> | null => {
    const result = validate(schema, toKitchenInput(values));
    if (result.ok) {
      setErrors({});
      return result.data;
    }
    setErrors(result.errors);
    return null;
  };

  const showServerError = (error: unknown) => {
    const split = splitServerError(error, KITCHEN_FIELDS);
    setErrors(split.fieldErrors);
    setGeneral(split.general);
  };

  return { values, errors, general, change, check, showServerError };
}
