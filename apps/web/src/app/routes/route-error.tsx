import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';

/** Last resort for an error no page caught, e.g. a page chunk that failed to download after a deploy. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error';
  return (
    <Box component="main" sx={{ maxWidth: 640, mx: 'auto', p: 3 }}>
      <Typography variant="h1" gutterBottom>
        Something went wrong
      </Typography>
      <Alert severity="error" sx={{ mb: 3 }}>
        {message}
      </Alert>
      <Button variant="contained" onClick={() => window.location.reload()}>
        Reload Jarday
      </Button>
    </Box>
  );
}
