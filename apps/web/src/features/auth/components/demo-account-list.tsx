import type { DemoAccount } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useDemoAccounts } from '../api/get-demo-accounts';

/** Lists the invented demo accounts when the server runs in demo mode; tapping one fills the form. */
export function DemoAccountList({ onPick }: { onPick: (account: DemoAccount) => void }) {
  const { data } = useDemoAccounts();
  if (!data?.demoMode || data.accounts.length === 0) return null;
  return (
    <Stack component="section" aria-labelledby="demo-accounts-heading" spacing={1.5}>
      <Typography id="demo-accounts-heading" variant="h2" sx={{ fontSize: '1.25rem' }}>
        Demo accounts
      </Typography>
      <Alert severity="info">This is a demo. Tap an account to fill in its e-mail and password.</Alert>
      {data.accounts.map((account) => (
        <Button
          key={account.email}
          variant="outlined"
          onClick={() => onPick(account)}
          aria-label={`Use demo account ${account.name} (${account.role})`}
          sx={{ justifyContent: 'flex-start', textAlign: 'left', flexDirection: 'column', alignItems: 'flex-start' }}
        >
          <span>
            {account.name} · {account.role}
          </span>
          <Typography component="span" variant="body2" sx={{ color: 'text.secondary' }}>
            {account.email}
          </Typography>
        </Button>
      ))}
    </Stack>
  );
}
