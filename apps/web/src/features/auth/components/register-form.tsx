import { registerSchema, type SessionView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState, type FormEvent } from 'react';
import { PasswordField } from '../../../components/ui/password-field';
import { ApiError } from '../../../lib/api-client';
import { splitServerError, validate, type FieldErrors } from '../../../lib/form-errors';
import { useRegister } from '../api/register';

/** Creates an account; field messages come from the same schema the server validates with. */
export function RegisterForm({ onRegistered }: { onRegistered: (session: SessionView) => void }) {
  const [values, setValues] = useState({ name: '', email: '', password: '' });
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);
  const register = useRegister({ onSuccess: onRegistered });

  const set = (field: keyof typeof values) => (e: { target: { value: string } }) => {
    setValues((v) => ({ ...v, [field]: e.target.value }));
    setErrors(({ [field]: _cleared, ...rest }) => rest);
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setGeneral(null);
    const result = validate(registerSchema, values);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    register.mutate(result.data, {
      onError: (error) => {
        if (error instanceof ApiError && error.code === 'email_taken') {
          setErrors({ email: error.message });
          return;
        }
        const split = splitServerError(error, ['name', 'email', 'password']);
        setErrors(split.fieldErrors);
        setGeneral(split.general);
      },
    });
  };

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5} aria-label="Create an account">
      {general ? <Alert severity="error">{general}</Alert> : null}
      <TextField
        label="Your name"
        autoComplete="name"
        value={values.name}
        onChange={set('name')}
        error={Boolean(errors.name)}
        helperText={errors.name ?? 'Shown to the people in your kitchens.'}
      />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        value={values.email}
        onChange={set('email')}
        error={Boolean(errors.email)}
        helperText={errors.email}
        slotProps={{ htmlInput: { inputMode: 'email' } }}
      />
      <PasswordField
        label="Password"
        autoComplete="new-password"
        value={values.password}
        onChange={set('password')}
        error={Boolean(errors.password)}
        helperText={errors.password ?? 'At least 10 characters.'}
      />
      <Button type="submit" variant="contained" size="large" disabled={register.isPending}>
        {register.isPending ? 'Creating your account…' : 'Create account'}
      </Button>
    </Stack>
  );
}
