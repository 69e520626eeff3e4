import { recipeInputSchema } from '@jarday/contracts';
import { useCallback, useDeferredValue, useMemo, useState } from 'react';
import { validate, type FieldErrors } from '../../../lib/form-errors';
import { draftToInput, type RecipeDraft } from '../utils/recipe-draft';

/** A message shows once its field (or a part of the form that contains it) was edited, or after a save attempt. */
const covers = (touched: string, path: string) => path === touched || path.startsWith(`${touched}.`);

const check = (draft: RecipeDraft) => validate(recipeInputSchema, draftToInput(draft));

/** Applies a change; `touch` names the part of the form whose messages may now show (null: none yet). */
export type EditDraft = (touch: string | null, change: (d: RecipeDraft) => RecipeDraft) => void;

/**
 * The editor's state. The draft is checked with the same schema the server uses on every change, so a message
 * appears at its cell as soon as that part was edited. The check runs on a deferred copy of the draft, so typing
 * stays quick on a slow tablet; `errors` keeps its identity while its messages stay the same, so the memoised
 * sections of the form only re-render when something in them changed.
 */
export function useRecipeDraft(initial: () => RecipeDraft) {
  const [draft, setDraft] = useState(initial);
  const [touched, setTouched] = useState<readonly string[]>([]);
  const [submitted, setSubmitted] = useState(false);
  const [serverErrors, setServerErrors] = useState<FieldErrors>({});

  const deferred = useDeferredValue(draft);
  const checked = useMemo(() => check(deferred), [deferred]);
  const shownKey = useMemo(() => {
    const all = checked.ok ? {} : checked.errors;
    const shown = Object.entries(all).filter(([path]) => submitted || touched.some((t) => covers(t, path)));
    return JSON.stringify({ ...Object.fromEntries(shown), ...serverErrors });
  }, [checked, submitted, touched, serverErrors]);
  const errors = useMemo(() => JSON.parse(shownKey) as FieldErrors, [shownKey]);

  const edit: EditDraft = useCallback((touch, change) => {
    setDraft(change);
    if (touch !== null) setTouched((t) => (t.includes(touch) ? t : [...t, touch]));
    setServerErrors({});
  }, []);

  /** Marks a save attempt, so every message shows; returns the check of the draft as it is now. */
  const attempt = () => {
    setSubmitted(true);
    return check(draft);
  };

  return { draft, deferred, edit, errors, attempt, setServerErrors };
}

export type DraftEditor = ReturnType<typeof useRecipeDraft>;
