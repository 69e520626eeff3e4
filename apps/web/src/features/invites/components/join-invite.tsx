import type { KitchenView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Loading, QueryError } from '../../../components/ui/query-state';
import { ApiError } from '../../../lib/api-client';
import { formatDateTime, ROLE_DESCRIPTIONS, ROLE_LABELS } from '../../../lib/labels';
import { useInvitePreview } from '../api/get-invite-preview';
import { useRedeemInvite } from '../api/redeem-invite';

interface JoinInviteProps {
  /** The normalised code: eight characters, no dash. */
  code: string;
  onJoined: (kitchen: KitchenView) => void;
  onOpenKitchen: (kitchenId: string) => void;
}

/** For a signed-in person: which kitchen the code opens, and a button to join it. */
export function JoinInvite({ code, onJoined, onOpenKitchen }: JoinInviteProps) {
  const preview = useInvitePreview(code);
  const redeem = useRedeemInvite(code, { onSuccess: onJoined });

  if (preview.isPending) return <Loading label="Checking the invite" />;
  if (preview.isError) {
    if (preview.error instanceof ApiError && preview.error.status === 404) {
      return (
        <Alert severity="error">
          This invite code does not work. It may have run out or been revoked; ask the kitchen&apos;s lead for a new
          one.
        </Alert>
      );
    }
    return <QueryError error={preview.error} onRetry={() => void preview.refetch()} />;
  }

  const invite = preview.data;
  return (
    <Card>
      <CardContent>
        <Stack spacing={2.5}>
          <Typography variant="h2">{invite.kitchenName}</Typography>
          {invite.alreadyMember ? (
            <>
              <Alert severity="info">You already belong to {invite.kitchenName}.</Alert>
              <Button variant="contained" size="large" onClick={() => onOpenKitchen(invite.kitchenId)}>
                Open {invite.kitchenName}
              </Button>
            </>
          ) : (
            <>
              <Typography>
                You are invited to join as <strong>{ROLE_LABELS[invite.role].toLowerCase()}</strong>:{' '}
                {ROLE_DESCRIPTIONS[invite.role].toLowerCase()}
              </Typography>
              <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                The invite works until {formatDateTime(invite.expiresAt)}.
              </Typography>
              {redeem.isError ? <Alert severity="error">{redeem.error.message}</Alert> : null}
              <Button variant="contained" size="large" onClick={() => redeem.mutate()} disabled={redeem.isPending}>
                Join {invite.kitchenName} as {invite.role}
              </Button>
            </>
          )}
        </Stack>
      </CardContent>
    </Card>
  );
}
