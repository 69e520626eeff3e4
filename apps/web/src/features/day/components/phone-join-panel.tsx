import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useCreatePhoneInvite } from '../api/create-phone-invite';
import { JoinQr } from './join-qr';

interface PhoneJoinPanelProps {
  kitchenId: string;
  kitchenName: string;
  dayTitle: string;
  pocketPath: string;
  isLead: boolean;
}

/**
 * How a helper's phone joins the day: members open the Pocket view link; for someone not yet in the kitchen, a lead
 * makes a one-day helper invite whose short code can be typed on the phone (the link carries `?next=` to the
 * Pocket view for when the join page follows it).
 */
export function PhoneJoinPanel({ kitchenId, kitchenName, dayTitle, pocketPath, isLead }: PhoneJoinPanelProps) {
  const invite = useCreatePhoneInvite(kitchenId);
  const origin = window.location.origin;
  const pocketLink = `${origin}${pocketPath}`;
  const code = invite.data?.code;
  const inviteLink = code ? `${origin}/join/${code.replace(/-/g, '')}?next=${encodeURIComponent(pocketPath)}` : null;

  return (
    <Paper variant="outlined" sx={{ p: 2.5, borderRadius: 4 }} component="section" aria-label="Join on a phone">
      <Typography variant="h2" sx={{ fontSize: '1.5rem', mb: 2 }}>
        Follow this day on a phone
      </Typography>
      <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', md: isLead ? '1fr 1fr' : '1fr' } }}>
        <Stack spacing={1.5}>
          <Typography sx={{ fontWeight: 700 }}>Already in {kitchenName}</Typography>
          <JoinQr link={pocketLink} label="QR code of the Pocket view link" />
          <Typography>
            Scan it, or in Jarday open {kitchenName} → Canning days → {dayTitle} → Pocket view.
          </Typography>
          <TextField
            label="Pocket view link"
            value={pocketLink}
            slotProps={{ htmlInput: { readOnly: true } }}
            onFocus={(e) => e.target.select()}
          />
        </Stack>
        {isLead ? (
          <Stack spacing={1.5}>
            <Typography sx={{ fontWeight: 700 }}>Not in the kitchen yet</Typography>
            {code && inviteLink ? (
              <>
                <JoinQr link={inviteLink} label="QR code of the helper invite" />
                <Box
                  data-testid="phone-invite-code"
                  sx={{
                    fontSize: '2.75rem',
                    fontWeight: 800,
                    letterSpacing: '0.12em',
                    fontVariantNumeric: 'tabular-nums',
                  }}
                >
                  {code}
                </Box>
                <Typography sx={{ color: 'text.secondary' }}>
                  Or type {window.location.host}/join/{code.replace(/-/g, '')} on the phone. Works for one day.
                </Typography>
                <TextField
                  label="Invite link"
                  value={inviteLink}
                  slotProps={{ htmlInput: { readOnly: true } }}
                  onFocus={(e) => e.target.select()}
                />
              </>
            ) : (
              <>
                <Typography>Make a one-day helper invite, then scan it with the phone.</Typography>
                <Button
                  variant="contained"
                  onClick={() => invite.mutate()}
                  disabled={invite.isPending}
                  sx={{ alignSelf: 'flex-start', minHeight: 64 }}
                >
                  Make a helper invite
                </Button>
              </>
            )}
            {invite.isError ? <Alert severity="error">{invite.error.message}</Alert> : null}
          </Stack>
        ) : null}
      </Box>
    </Paper>
  );
}
