import { inviteCodeSchema, type KitchenView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useQueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { CenteredCard } from '../../components/layouts/centered-card';
import { paths, safeReturnPath } from '../../config/paths';
import { useSessionStatus } from '../../features/auth/stores/session-store';
import { JoinInvite } from '../../features/invites/components/join-invite';
import { kitchenKeys } from '../../features/kitchens/api/kitchen-keys';

export default function JoinRoute() {
  const { code: raw = '' } = useParams();
  const parsed = inviteCodeSchema.safeParse(raw);
  const signedIn = useSessionStatus() === 'signed-in';
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  // Where to go once joined, e.g. the day's Pocket view when the invite came from the Counter board's QR code.
  const next = useSearchParams()[0].get('next');

  if (!parsed.success) {
    return (
      <CenteredCard title="Join a kitchen">
        <Alert severity="error">{parsed.error.issues[0]?.message ?? 'This invite code is not valid.'}</Alert>
      </CenteredCard>
    );
  }
  const code = parsed.data;
  const here = next ? `${paths.join(code)}?next=${encodeURIComponent(next)}` : paths.join(code);

  if (!signedIn) {
    return (
      <CenteredCard
        title="Join a kitchen"
        intro="You have an invite to a kitchen on Jarday. Sign in or create an account, and you will come straight back here to join."
      >
        <Stack spacing={1.5}>
          <Button component={RouterLink} to={paths.signIn(here)} variant="contained" size="large">
            Sign in
          </Button>
          <Button component={RouterLink} to={paths.register(here)} variant="outlined" size="large">
            Create an account
          </Button>
        </Stack>
      </CenteredCard>
    );
  }

  const joined = (kitchen: KitchenView) => {
    queryClient.setQueryData(kitchenKeys.detail(kitchen.id), kitchen);
    void queryClient.invalidateQueries({ queryKey: kitchenKeys.list() });
    void navigate(next ? safeReturnPath(next, paths.kitchen(kitchen.id)) : paths.kitchen(kitchen.id), {
      replace: true,
    });
  };

  return (
    <CenteredCard title="Join a kitchen">
      <JoinInvite
        code={code}
        onJoined={joined}
        onOpenKitchen={(id) => void navigate(next ? safeReturnPath(next, paths.kitchen(id)) : paths.kitchen(id))}
      />
    </CenteredCard>
  );
}
