import { type CreatedInviteView, createInviteSchema } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState, type FormEvent } from 'react';
import { splitServerError, validate, type FieldErrors } from '../../../lib/form-errors';
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from '../../../lib/labels';
import { useCreateInvite } from '../api/create-invite';
import { InviteCodeCard } from './invite-code-card';

const INVITABLE = ['helper', 'watcher'] as const;
const EXPIRY_DAYS = [1, 3, 7, 14, 30] as const;

/**
 * A lead creates an invite for a helper or a watcher; the new code is shown large with its link. With an e-mail
 * address, the server also mails the link there.
 */
export function CreateInviteForm({ kitchenId }: { kitchenId: string }) {
  const [role, setRole] = useState<(typeof INVITABLE)[number]>('helper');
  const [days, setDays] = useState('7');
  const [email, setEmail] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);
  const [created, setCreated] = useState<{ invite: CreatedInviteView; askedEmail: boolean } | null>(null);
  const create = useCreateInvite(kitchenId);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setGeneral(null);
    const result = validate(createInviteSchema, {
      role,
      expiresInDays: Number(days),
      ...(email.trim() !== '' && { email }),
    });
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    const askedEmail = result.data.email !== undefined;
    create.mutate(result.data, {
      onSuccess: (invite) => {
        setCreated({ invite, askedEmail });
        // A second invite should not go to the same person by accident.
        setEmail('');
      },
      onError: (error) => {
        const split = splitServerError(error, ['role', 'expiresInDays', 'email']);
        setErrors(split.fieldErrors);
        setGeneral(split.general);
      },
    });
  };

  return (
    <Stack spacing={3}>
      <Stack component="form" noValidate onSubmit={submit} spacing={2.5} aria-label="Create an invite">
        {general ? <Alert severity="error">{general}</Alert> : null}
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
          <TextField
            select
            label="Invite as"
            value={role}
            onChange={(e) => setRole(e.target.value as (typeof INVITABLE)[number])}
            error={Boolean(errors.role)}
            helperText={errors.role ?? ROLE_DESCRIPTIONS[role]}
            slotProps={{ select: { native: true } }}
          >
            {INVITABLE.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </TextField>
          <TextField
            select
            label="Works for"
            value={days}
            onChange={(e) => setDays(e.target.value)}
            error={Boolean(errors.expiresInDays)}
            helperText={errors.expiresInDays}
            slotProps={{ select: { native: true } }}
          >
            {EXPIRY_DAYS.map((d) => (
              <option key={d} value={String(d)}>
                {d === 1 ? '1 day' : `${d} days`}
              </option>
            ))}
          </TextField>
        </Stack>
        <TextField
          label="E-mail the link to (optional)"
          type="email"
          autoComplete="off"
          inputMode="email"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          error={Boolean(errors.email)}
          helperText={errors.email ?? 'Leave it empty to share the code or the link yourself.'}
        />
        <Button
          type="submit"
          variant="contained"
          size="large"
          disabled={create.isPending}
          sx={{ alignSelf: 'flex-start' }}
        >
          {create.isPending ? 'Creating…' : 'Create invite'}
        </Button>
      </Stack>
      {created ? <InviteCodeCard invite={created.invite} askedEmail={created.askedEmail} /> : null}
    </Stack>
  );
}
