import type { MemberView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Divider from '@mui/material/Divider';
import Stack from '@mui/material/Stack';
import { Fragment, useState } from 'react';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Loading, QueryError } from '../../../components/ui/query-state';
import { useMembers } from '../api/get-members';
import { useRemoveMember } from '../api/remove-member';
import { useUpdateMember } from '../api/update-member';
import { MemberRow } from './member-row';
import { ReminderSwitch } from './reminder-switch';

interface MemberListProps {
  kitchenId: string;
  kitchenName: string;
  currentUserId: string;
  /** Only a lead changes roles and removes others; the server refuses anyone else. */
  canManage: boolean;
  onLeft: () => void;
  onChanged?: () => void;
}

/** The kitchen's members with their roles. */
export function MemberList({ kitchenId, kitchenName, currentUserId, canManage, onLeft, onChanged }: MemberListProps) {
  const members = useMembers(kitchenId);
  const [pending, setPending] = useState<MemberView | null>(null);
  const update = useUpdateMember(kitchenId, { onSuccess: onChanged });
  const remove = useRemoveMember(kitchenId, {
    onSuccess: ({ self }) => {
      setPending(null);
      if (self) onLeft();
      else onChanged?.();
    },
  });

  if (members.isPending) return <Loading label="Loading members" />;
  if (members.isError) return <QueryError error={members.error} onRetry={() => void members.refetch()} />;

  const leaving = pending?.userId === currentUserId;
  return (
    <Stack>
      {update.isError ? <Alert severity="error">{update.error.message}</Alert> : null}
      <Stack component="ul" sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Members">
        {members.data.map((member, index) => (
          <Fragment key={member.userId}>
            {index > 0 ? <Divider component="li" aria-hidden /> : null}
            <li>
              <MemberRow
                member={member}
                isMe={member.userId === currentUserId}
                canManage={canManage}
                busy={update.isPending || remove.isPending}
                onRoleChange={(role) => update.mutate({ userId: member.userId, role })}
                onRemove={() => {
                  remove.reset();
                  setPending(member);
                }}
              />
            </li>
          </Fragment>
        ))}
      </Stack>
      <Divider aria-hidden />
      <ReminderSwitch kitchenId={kitchenId} />
      <ConfirmDialog
        open={pending !== null}
        title={leaving ? `Leave ${kitchenName}?` : `Remove ${pending?.name ?? ''}?`}
        confirmLabel={leaving ? 'Leave kitchen' : 'Remove'}
        pending={remove.isPending}
        error={remove.isError ? remove.error.message : null}
        onClose={() => setPending(null)}
        onConfirm={() => pending && remove.mutate({ userId: pending.userId, self: leaving })}
      >
        {leaving
          ? 'You will no longer see this kitchen. A lead can invite you again.'
          : `${pending?.name ?? 'This person'} will lose access to ${kitchenName}. A lead can invite them again.`}
      </ConfirmDialog>
    </Stack>
  );
}
