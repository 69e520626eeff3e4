import type { CaughtMailView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { ApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/labels';
import { Loading, QueryError } from '../../../components/ui/query-state';
import { useCaughtMail } from '../api/get-caught-mail';

function CaughtMail({ mail }: { mail: CaughtMailView }) {
  return (
    <Card component="li" sx={{ listStyle: 'none' }}>
      <CardContent>
        <Stack spacing={1}>
          <Typography variant="h3" component="h2">
            {mail.subject}
          </Typography>
          <Typography variant="body2" sx={{ color: 'text.secondary', overflowWrap: 'anywhere' }}>
            To {mail.to.join(', ')} · {formatDateTime(mail.at)}
          </Typography>
          <Typography component="pre" sx={{ whiteSpace: 'pre-wrap', overflowWrap: 'anywhere', m: 0, font: 'inherit' }}>
            {mail.text}
          </Typography>
          {mail.links.map((link) => (
            <Link key={link} href={link} sx={{ overflowWrap: 'anywhere', fontWeight: 600, py: 1 }}>
              {link}
            </Link>
          ))}
        </Stack>
      </CardContent>
    </Card>
  );
}

/** What the server's loopback mail catcher received, newest first; refreshed every few seconds. */
export function CaughtMailList() {
  const mail = useCaughtMail();
  if (mail.isPending) return <Loading label="Loading caught mail" />;
  if (mail.isError) {
    if (mail.error instanceof ApiError && mail.error.status === 404) {
      return (
        <Alert severity="info">
          This server runs no mail catcher, or you are not on its machine: its mail goes out through SMTP_URL, or
          nowhere.
        </Alert>
      );
    }
    return <QueryError error={mail.error} onRetry={() => void mail.refetch()} />;
  }
  if (mail.data.length === 0) return <Typography>Nothing caught yet. Invites and reminders will show here.</Typography>;
  return (
    <Stack component="ul" spacing={2} sx={{ p: 0, m: 0 }} aria-label="Caught mail">
      {mail.data.map((m) => (
        <CaughtMail key={`${m.at}-${m.to.join()}-${m.subject}`} mail={m} />
      ))}
    </Stack>
  );
}
