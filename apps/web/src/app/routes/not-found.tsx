import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../config/paths';

export default function NotFoundRoute() {
  return (
    <>
      <Typography variant="h1" gutterBottom>
        Page not found
      </Typography>
      <Typography sx={{ mb: 3 }}>There is no page at this address.</Typography>
      <Button component={RouterLink} to={paths.kitchens()} variant="contained">
        Go to my kitchens
      </Button>
    </>
  );
}
