import { ROLES, type MemberView, type Role } from '@jarday/contracts';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { ROLE_LABELS } from '../../../lib/labels';

interface MemberRowProps {
  member: MemberView;
  isMe: boolean;
  canManage: boolean;
  busy: boolean;
  onRoleChange: (role: Role) => void;
  onRemove: () => void;
}

/** One member: a role picker and "Remove" for a lead, "Leave kitchen" on my own row. */
export function MemberRow({ member, isMe, canManage, busy, onRoleChange, onRemove }: MemberRowProps) {
  return (
    <Stack direction={{ xs: 'column', sm: 'row' }} sx={{ alignItems: { xs: 'stretch', sm: 'center' }, gap: 2, py: 2 }}>
      <Stack sx={{ flex: 1, minWidth: 0 }}>
        <Typography sx={{ fontWeight: 500 }}>
          {member.name}
          {isMe ? ' (you)' : ''}
        </Typography>
        <Typography variant="body2" sx={{ color: 'text.secondary', overflowWrap: 'anywhere' }}>
          {member.email}
        </Typography>
      </Stack>
      {canManage ? (
        <TextField
          select
          label={`Role for ${member.name}`}
          value={member.role}
          onChange={(e) => onRoleChange(e.target.value as Role)}
          disabled={busy}
          sx={{ width: { xs: '100%', sm: 200 } }}
          slotProps={{ select: { native: true } }}
        >
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {ROLE_LABELS[role]}
            </option>
          ))}
        </TextField>
      ) : (
        <Chip label={ROLE_LABELS[member.role]} color={member.role === 'lead' ? 'primary' : 'default'} />
      )}
      {isMe ? (
        <Button variant="outlined" color="error" onClick={onRemove} disabled={busy}>
          Leave kitchen
        </Button>
      ) : canManage ? (
        <Button
          variant="outlined"
          color="error"
          onClick={onRemove}
          disabled={busy}
          aria-label={`Remove ${member.name}`}
        >
          Remove
        </Button>
      ) : null}
    </Stack>
  );
}
