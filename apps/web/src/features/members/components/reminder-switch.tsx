import Alert from '@mui/material/Alert';
import FormControlLabel from '@mui/material/FormControlLabel';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import Typography from '@mui/material/Typography';
import { useMyMembership, useUpdateMyMembership } from '../api/my-membership';

/**
 * The signed-in person's own choice: e-mail reminders when a load's bands may come off and when the last hours
 * to reprocess its unsealed jars begin. Leads and helpers get them; a watcher's choice is kept for a later role.
 */
export function ReminderSwitch({ kitchenId }: { kitchenId: string }) {
  const me = useMyMembership(kitchenId);
  const update = useUpdateMyMembership(kitchenId);
  if (!me.data) return null;
  const on = update.isPending ? (update.variables?.reminders ?? me.data.reminders) : me.data.reminders;
  return (
    <Stack spacing={1} sx={{ pt: 2 }}>
      <FormControlLabel
        sx={{ m: 0, gap: 1.5, minHeight: 56 }}
        control={
          <Switch
            checked={on}
            disabled={update.isPending}
            onChange={(e) => update.mutate({ reminders: e.target.checked })}
            slotProps={{ input: { 'aria-describedby': `reminders-help-${kitchenId}` } }}
          />
        }
        label={<Typography sx={{ fontWeight: 600 }}>E-mail me reminders</Typography>}
      />
      <Typography id={`reminders-help-${kitchenId}`} variant="body2" sx={{ color: 'text.secondary' }}>
        {me.data.role === 'watcher'
          ? 'Reminders go to leads and helpers, who take the bands off and reprocess jars. Your choice is kept if your role changes.'
          : 'When a load\u2019s bands may come off (12 hours after lifting) and 2 hours before unsealed jars can no longer be reprocessed.'}
      </Typography>
      {update.isError ? <Alert severity="error">{update.error.message}</Alert> : null}
    </Stack>
  );
}
