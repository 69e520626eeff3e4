import AppBar from '@mui/material/AppBar';
import Box from '@mui/material/Box';
import Container from '@mui/material/Container';
import LinearProgress from '@mui/material/LinearProgress';
import Link from '@mui/material/Link';
import Toolbar from '@mui/material/Toolbar';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, Outlet, useMatch, useNavigate, useNavigation } from 'react-router-dom';
import { ColorModeToggle } from '../../components/layouts/color-mode-toggle';
import { paths } from '../../config/paths';
import { AccountMenu } from '../../features/auth/components/account-menu';
import { useSessionStatus } from '../../features/auth/stores/session-store';
import { useKitchen } from '../../features/kitchens/api/get-kitchen';

/** The kitchen named in the address bar, for the app bar; nothing outside a kitchen. */
function CurrentKitchen({ signedIn }: { signedIn: boolean }) {
  const match = useMatch('/kitchens/:kitchenId/*');
  const kitchenId = signedIn ? match?.params.kitchenId : undefined;
  const kitchen = useKitchen(kitchenId);
  if (!kitchenId || !kitchen.data) return null;
  return (
    <Link
      component={RouterLink}
      to={paths.kitchen(kitchenId)}
      color="inherit"
      underline="hover"
      sx={{ minWidth: 0, overflow: 'hidden', textOverflow: 'ellipsis', whiteSpace: 'nowrap', fontSize: '1.125rem' }}
    >
      {kitchen.data.name}
    </Link>
  );
}

/** App bar (wordmark, current kitchen, colours, account) above every page. */
export function RootLayout() {
  const status = useSessionStatus();
  const navigation = useNavigation();
  const navigate = useNavigate();
  const signedIn = status === 'signed-in';

  return (
    <Box sx={{ minHeight: '100vh', display: 'flex', flexDirection: 'column' }}>
      <Link
        href="#main"
        sx={{
          position: 'absolute',
          left: 8,
          top: -80,
          zIndex: 2000,
          p: 2,
          bgcolor: 'background.paper',
          '&:focus': { top: 8 },
        }}
      >
        Skip to content
      </Link>
      <AppBar position="sticky">
        <Toolbar sx={{ minHeight: { xs: 64, sm: 72 }, gap: { xs: 1, sm: 2 } }}>
          <Typography
            component={RouterLink}
            to={signedIn ? paths.kitchens() : paths.signIn()}
            sx={{
              color: 'inherit',
              textDecoration: 'none',
              fontWeight: 700,
              fontSize: '1.5rem',
              letterSpacing: '0.02em',
            }}
          >
            Jarday
          </Typography>
          <Box sx={{ flex: 1, minWidth: 0, display: 'flex' }}>
            <CurrentKitchen signedIn={signedIn} />
          </Box>
          <ColorModeToggle />
          {signedIn ? <AccountMenu onSignedOut={() => void navigate(paths.signIn(), { replace: true })} /> : null}
        </Toolbar>
        {navigation.state === 'loading' ? (
          <LinearProgress
            color="secondary"
            aria-label="Loading page"
            sx={{ position: 'absolute', bottom: 0, left: 0, right: 0 }}
          />
        ) : null}
      </AppBar>
      <Container
        component="main"
        id="main"
        tabIndex={-1}
        maxWidth="md"
        sx={{ py: { xs: 3, sm: 4 }, flex: 1, outline: 'none' }}
      >
        <Outlet />
      </Container>
    </Box>
  );
}
