import Download from '@mui/icons-material/Download';
import PictureAsPdf from '@mui/icons-material/PictureAsPdf';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { downloadExport } from '../api/journal-api';

/** CSV of every entry and the printable PDF day record, fetched with the session and saved by the browser. */
export function ExportButtons({ kitchenId, dayId, date }: { kitchenId: string; dayId: string; date: string }) {
  const [busy, setBusy] = useState<'csv' | 'pdf' | null>(null);
  const [error, setError] = useState<string | null>(null);
  const save = async (kind: 'csv' | 'pdf') => {
    setBusy(kind);
    setError(null);
    try {
      await downloadExport(
        kitchenId,
        dayId,
        kind,
        kind === 'csv' ? `jarday-${date}-journal.csv` : `jarday-${date}-day-record.pdf`,
      );
    } catch (e) {
      setError(e instanceof Error ? e.message : 'The export failed.');
    } finally {
      setBusy(null);
    }
  };
  return (
    <Stack spacing={1}>
      <Stack direction="row" sx={{ gap: 1.5, flexWrap: 'wrap' }}>
        <Button variant="outlined" startIcon={<Download />} disabled={busy !== null} onClick={() => void save('csv')}>
          {busy === 'csv' ? 'Preparing CSV…' : 'Download CSV'}
        </Button>
        <Button
          variant="outlined"
          startIcon={<PictureAsPdf />}
          disabled={busy !== null}
          onClick={() => void save('pdf')}
        >
          {busy === 'pdf' ? 'Preparing PDF…' : 'Day record (PDF)'}
        </Button>
      </Stack>
      {error ? <Alert severity="error">{error}</Alert> : null}
    </Stack>
  );
}
