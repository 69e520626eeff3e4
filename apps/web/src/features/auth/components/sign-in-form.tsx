import { signInSchema, type DemoAccount, type SessionView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState, type FormEvent } from 'react';
import { PasswordField } from '../../../components/ui/password-field';
import { splitServerError, validate, type FieldErrors } from '../../../lib/form-errors';
import { useSignIn } from '../api/sign-in';
import { DemoAccountList } from './demo-account-list';

/** E-mail and password; on success the session is stored and `onSignedIn` decides where to go. */
export function SignInForm({ onSignedIn }: { onSignedIn: (session: SessionView) => void }) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);
  const signIn = useSignIn({ onSuccess: onSignedIn });

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setGeneral(null);
    const result = validate(signInSchema, { email, password });
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    signIn.mutate(result.data, {
      onError: (error) => {
        const split = splitServerError(error, ['email', 'password']);
        setErrors(split.fieldErrors);
        setGeneral(split.general);
      },
    });
  };

  const fill = (account: DemoAccount) => {
    setEmail(account.email);
    setPassword(account.password);
    setErrors({});
    setGeneral(null);
  };

  return (
    <Stack spacing={3}>
      <Stack component="form" noValidate onSubmit={submit} spacing={2.5} aria-label="Sign in">
        {general ? <Alert severity="error">{general}</Alert> : null}
        <TextField
          label="E-mail"
          type="email"
          autoComplete="email"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          error={Boolean(errors.email)}
          helperText={errors.email}
          slotProps={{ htmlInput: { inputMode: 'email' } }}
        />
        <PasswordField
          label="Password"
          autoComplete="current-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={Boolean(errors.password)}
          helperText={errors.password}
        />
        <Button type="submit" variant="contained" size="large" disabled={signIn.isPending}>
          {signIn.isPending ? 'Signing in…' : 'Sign in'}
        </Button>
      </Stack>
      <DemoAccountList onPick={fill} />
    </Stack>
  );
}
