import type { InviteView } from '@jarday/contracts';
import Button from '@mui/material/Button';
import Divider from '@mui/material/Divider';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Fragment, useState } from 'react';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Loading, QueryError } from '../../../components/ui/query-state';
import { formatDateTime, ROLE_LABELS } from '../../../lib/labels';
import { useInvites } from '../api/get-invites';
import { useRevokeInvite } from '../api/revoke-invite';

/** Open invites of a kitchen (lead only), each with a revoke button. */
export function InviteList({ kitchenId }: { kitchenId: string }) {
  const invites = useInvites(kitchenId);
  const [pending, setPending] = useState<InviteView | null>(null);
  const revoke = useRevokeInvite(kitchenId, { onSuccess: () => setPending(null) });

  if (invites.isPending) return <Loading label="Loading invites" />;
  if (invites.isError) return <QueryError error={invites.error} onRetry={() => void invites.refetch()} />;
  if (invites.data.length === 0) {
    return <Typography sx={{ color: 'text.secondary' }}>No open invites.</Typography>;
  }

  return (
    <>
      <Stack component="ul" sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Open invites">
        {invites.data.map((invite, index) => (
          <Fragment key={invite.id}>
            {index > 0 ? <Divider component="li" aria-hidden /> : null}
            <Stack
              component="li"
              direction={{ xs: 'column', sm: 'row' }}
              sx={{ alignItems: { xs: 'stretch', sm: 'center' }, gap: 2, py: 2 }}
            >
              <Stack sx={{ flex: 1 }}>
                <Typography sx={{ fontWeight: 700, fontSize: '1.375rem', letterSpacing: '0.08em' }}>
                  {invite.code}
                </Typography>
                <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                  {ROLE_LABELS[invite.role]} · until {formatDateTime(invite.expiresAt)} · by {invite.createdByName}
                </Typography>
              </Stack>
              <Button
                variant="outlined"
                color="error"
                onClick={() => {
                  revoke.reset();
                  setPending(invite);
                }}
                aria-label={`Revoke invite ${invite.code}`}
              >
                Revoke
              </Button>
            </Stack>
          </Fragment>
        ))}
      </Stack>
      <ConfirmDialog
        open={pending !== null}
        title={`Revoke invite ${pending?.code ?? ''}?`}
        confirmLabel="Revoke"
        pending={revoke.isPending}
        error={revoke.isError ? revoke.error.message : null}
        onClose={() => setPending(null)}
        onConfirm={() => pending && revoke.mutate(pending.id)}
      >
        The code and its link stop working at once. People who already joined stay in the kitchen.
      </ConfirmDialog>
    </>
  );
}
