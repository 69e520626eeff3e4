import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { CenteredCard } from '../../components/layouts/centered-card';
import { paths } from '../../config/paths';
import { RegisterForm } from '../../features/auth/components/register-form';
import { useReturnPath } from './use-return-path';

export default function RegisterRoute() {
  const navigate = useNavigate();
  const { next, carry } = useReturnPath();
  return (
    <CenteredCard title="Create an account" intro="One account works in every kitchen you are invited to.">
      <RegisterForm onRegistered={() => void navigate(next, { replace: true })} />
      <Typography>
        Already have an account?{' '}
        <Link component={RouterLink} to={paths.signIn(carry)}>
          Sign in
        </Link>
      </Typography>
    </CenteredCard>
  );
}
