import CloudOff from '@mui/icons-material/CloudOff';
import Sync from '@mui/icons-material/Sync';
import Alert from '@mui/material/Alert';
import { useLiveStore } from '../stores/live-store';

const time = (ms: number) =>
  new Date(ms).toLocaleTimeString(undefined, { hour: '2-digit', minute: '2-digit', second: '2-digit' });

/**
 * Says plainly when the board may be behind: offline, or reconnecting, with the time of the last sync. The clocks
 * keep counting from the last deadlines meanwhile; a reconnect fetches whatever was missed.
 */
export function ConnectionBanner() {
  const connection = useLiveStore((s) => s.connection);
  const lastSyncAt = useLiveStore((s) => s.lastSyncAt);
  const problem = useLiveStore((s) => s.problem);
  const since = lastSyncAt ? ` Last synced at ${time(lastSyncAt)}.` : '';

  if (connection === 'refused') {
    return (
      <Alert severity="error" role="alert" data-testid="connection-banner" data-connection={connection}>
        {problem ?? 'The server would not open this day.'}
      </Alert>
    );
  }
  if (connection !== 'offline' && connection !== 'reconnecting') return null;
  return (
    <Alert
      severity="warning"
      icon={connection === 'offline' ? <CloudOff /> : <Sync />}
      role="status"
      data-testid="connection-banner"
      data-connection={connection}
      sx={{ fontSize: '1.15rem', fontWeight: 500 }}
    >
      {connection === 'offline' ? 'Offline: no network.' : 'Reconnecting…'}
      {since} Timers keep counting here; taps reach the others only once the link is back.
    </Alert>
  );
}
