import ContentCopy from '@mui/icons-material/ContentCopy';
import type { CreatedInviteView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useId, useState, type FocusEvent } from 'react';
import { formatDateTime, ROLE_LABELS } from '../../../lib/labels';
import { inviteLink } from '../utils/invite-link';

type CopyState = 'idle' | 'copied' | 'failed';

/** Whom the link was mailed to, or why it was not. */
function EmailNote({ invite, askedEmail }: { invite: CreatedInviteView; askedEmail: boolean }) {
  const to = invite.emailedTo;
  if (to) {
    return (
      <Alert severity="success" data-testid="invite-emailed">
        The link is on its way to {to}. If it does not arrive, share the code or the link yourself.
      </Alert>
    );
  }
  if (!askedEmail) return null;
  return <Alert severity="warning">This server does not send e-mail. Share the code or the link below yourself.</Alert>;
}

/** A fresh invite: the code large enough to read across a kitchen, and the link with a copy button. */
export function InviteCodeCard({ invite, askedEmail = false }: { invite: CreatedInviteView; askedEmail?: boolean }) {
  const link = inviteLink(invite.code);
  const [copy, setCopy] = useState<CopyState>('idle');
  const codeId = useId();

  const copyLink = async () => {
    try {
      await navigator.clipboard.writeText(link);
      setCopy('copied');
    } catch {
      // Clipboard access needs a secure context and permission; the link stays selectable by hand.
      setCopy('failed');
    }
  };

  return (
    <Card sx={{ borderColor: 'secondary.main', borderWidth: 2 }}>
      <CardContent>
        <Stack spacing={2}>
          <Typography id={codeId} variant="h3" component="h3">
            New invite code
          </Typography>
          <Typography
            aria-labelledby={codeId}
            sx={{ fontSize: { xs: '2.5rem', sm: '3.5rem' }, fontWeight: 700, letterSpacing: '0.12em', lineHeight: 1.1 }}
            data-testid="invite-code"
          >
            {invite.code}
          </Typography>
          <EmailNote invite={invite} askedEmail={askedEmail} />
          <Typography sx={{ color: 'text.secondary' }}>
            Joins as {ROLE_LABELS[invite.role].toLowerCase()} · works until {formatDateTime(invite.expiresAt)}
          </Typography>
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5} sx={{ alignItems: { sm: 'flex-start' } }}>
            <TextField
              label="Invite link"
              value={link}
              slotProps={{
                htmlInput: { readOnly: true, onFocus: (e: FocusEvent<HTMLInputElement>) => e.currentTarget.select() },
              }}
            />
            <Button
              variant="contained"
              color="secondary"
              startIcon={<ContentCopy />}
              onClick={() => void copyLink()}
              sx={{ flexShrink: 0, whiteSpace: 'nowrap' }}
            >
              Copy link
            </Button>
          </Stack>
          {copy === 'copied' ? (
            <Alert severity="success" role="status">
              Link copied. Send it to the person you are inviting.
            </Alert>
          ) : null}
          {copy === 'failed' ? (
            <Alert severity="warning" role="status">
              This browser did not allow copying. Select the link above and copy it by hand.
            </Alert>
          ) : null}
        </Stack>
      </CardContent>
    </Card>
  );
}
