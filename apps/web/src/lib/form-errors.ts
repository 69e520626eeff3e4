import type { z } from 'zod';
import { ApiError } from './api-client';

/** Field messages keyed by dotted path, e.g. `altitude.value` or `capacity.quart`. */
export type FieldErrors = Record<string, string>;

export type Validated<T> = { ok: true; data: T } | { ok: false; errors: FieldErrors };

/**
 * Runs a shared contract schema over form values, so the form shows exactly the messages the server
 * would send. Issues without a path land under `form`.
 */
export function validate<S extends z.ZodType>(schema: S, values: unknown): Validated<z.output<S>> {
  const result = schema.safeParse(values);
  if (result.success) return { ok: true, data: result.data };
  const errors: FieldErrors = {};
  for (const issue of result.error.issues) {
    const key = issue.path.length ? issue.path.map(String).join('.') : 'form';
    errors[key] ??= issue.message;
  }
  return { ok: false, errors };
}

/**
 * Splits a failed request into field messages (from the server's `issues`) and a general message for
 * an alert. When every issue found its field the general message is left out.
 */
export function splitServerError(
  error: unknown,
  fields: readonly string[],
): { fieldErrors: FieldErrors; general: string | null } {
  if (!(error instanceof ApiError)) {
    return { fieldErrors: {}, general: 'Something went wrong. Try again.' };
  }
  const all = error.fieldErrors();
  const fieldErrors: FieldErrors = {};
  let unplaced = false;
  for (const [path, message] of Object.entries(all)) {
    if (fields.some((f) => path === f || path.startsWith(`${f}.`))) fieldErrors[path] = message;
    else unplaced = true;
  }
  const placedAll = Object.keys(fieldErrors).length > 0 && !unplaced;
  return { fieldErrors, general: placedAll ? null : error.message };
}

/** Turns a number field's text into what the schema should see: empty stays missing, not 0. */
export function numberOrUndefined(text: string): number | undefined {
  const trimmed = text.trim();
  return trimmed === '' ? undefined : Number(trimmed);
}
