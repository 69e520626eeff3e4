import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import type { ReactNode } from 'react';

/** A centred spinner with a name for screen readers. */
export function Loading({ label = 'Loading' }: { label?: string }) {
  return (
    <Box sx={{ display: 'flex', justifyContent: 'center', py: 6 }}>
      <CircularProgress aria-label={label} />
    </Box>
  );
}

/** The message of a failed query, with a retry button when one is given. */
export function QueryError({ error, onRetry, title }: { error: Error; onRetry?: () => void; title?: ReactNode }) {
  return (
    <Alert
      severity="error"
      action={
        onRetry ? (
          <Button color="inherit" onClick={onRetry}>
            Try again
          </Button>
        ) : undefined
      }
    >
      {title ? <strong>{title} </strong> : null}
      {error.message}
    </Alert>
  );
}
