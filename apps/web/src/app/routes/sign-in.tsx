import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { CenteredCard } from '../../components/layouts/centered-card';
import { paths } from '../../config/paths';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { useReturnPath } from './use-return-path';

export default function SignInRoute() {
  const navigate = useNavigate();
  const { next, carry } = useReturnPath();
  return (
    <CenteredCard
      title="Sign in"
      intro={carry ? 'Sign in to carry on where you were.' : 'Welcome back to the kitchen.'}
    >
      <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
      <Typography>
        New to Jarday?{' '}
        <Link component={RouterLink} to={paths.register(carry)}>
          Create an account
        </Link>
      </Typography>
    </CenteredCard>
  );
}
