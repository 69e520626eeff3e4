import type { AttachmentView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import { useBlobUrl } from '../hooks/use-blob-url';

/** The whole photo, or for a PDF a way to save or open it (the browser's own viewer takes it from there). */
export function AttachmentViewer({
  kitchenId,
  attachment,
  onClose,
}: {
  kitchenId: string;
  attachment: AttachmentView | null;
  onClose: () => void;
}) {
  const blob = useBlobUrl(kitchenId, attachment?.id ?? null, 'file');
  const isPdf = attachment?.mime === 'application/pdf';
  return (
    <Dialog open={attachment !== null} onClose={onClose} fullWidth maxWidth="md">
      <DialogTitle>{attachment?.fileName}</DialogTitle>
      <DialogContent sx={{ display: 'flex', justifyContent: 'center', minHeight: 120 }}>
        {blob.status === 'loading' ? <CircularProgress aria-label="Loading the file" /> : null}
        {blob.status === 'error' ? <Alert severity="error">{blob.message}</Alert> : null}
        {blob.status === 'ready' && !isPdf ? (
          <Box
            component="img"
            src={blob.url}
            alt={attachment?.fileName}
            sx={{ maxWidth: '100%', maxHeight: '70vh', objectFit: 'contain' }}
          />
        ) : null}
        {blob.status === 'ready' && isPdf ? (
          <Button variant="contained" size="large" href={blob.url} download={attachment?.fileName}>
            Save the PDF
          </Button>
        ) : null}
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 3 }}>
        <Button onClick={onClose} size="large">
          Close
        </Button>
      </DialogActions>
    </Dialog>
  );
}
