import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import { useEffect, useState, type ReactNode } from 'react';
import { useSessionRenewal } from '../hooks/use-session-renewal';
import { restoreSession, type RestoreOutcome } from '../utils/session';

/**
 * Holds the app until the start-up refresh has answered, so pages never flash "signed out" for a person
 * who is signed in; then keeps the token fresh for as long as the app is open.
 */
export function SessionGate({ children }: { children: ReactNode }) {
  const [outcome, setOutcome] = useState<RestoreOutcome | 'pending'>('pending');
  useSessionRenewal();

  useEffect(() => {
    void restoreSession().then(setOutcome);
  }, []);
  const retry = () => {
    setOutcome('pending');
    void restoreSession().then(setOutcome);
  };

  if (outcome === 'pending') {
    return (
      <Box sx={{ display: 'grid', placeItems: 'center', minHeight: '100vh' }}>
        <CircularProgress aria-label="Starting Jarday" />
      </Box>
    );
  }
  if (outcome === 'unreachable') {
    return (
      <Box sx={{ display: 'grid', placeItems: 'center', minHeight: '100vh', p: 3 }}>
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={retry}>
              Try again
            </Button>
          }
        >
          Cannot reach the Jarday server. Check the connection and try again.
        </Alert>
      </Box>
    );
  }
  return children;
}
