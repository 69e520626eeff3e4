import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import { useId, type ReactNode } from 'react';

interface ConfirmDialogProps {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  pending?: boolean;
  error?: string | null;
  onConfirm: () => void;
  onClose: () => void;
}

/** Asks before an action that cannot be undone (removing a member, revoking an invite, deleting a canner). */
export function ConfirmDialog(props: ConfirmDialogProps) {
  const titleId = useId();
  return (
    <Dialog open={props.open} onClose={props.onClose} aria-labelledby={titleId} fullWidth maxWidth="xs">
      <DialogTitle id={titleId}>{props.title}</DialogTitle>
      <DialogContent>
        <DialogContentText component="div">{props.children}</DialogContentText>
        {props.error ? (
          <Alert severity="error" sx={{ mt: 2 }}>
            {props.error}
          </Alert>
        ) : null}
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 3, gap: 1 }}>
        <Button onClick={props.onClose}>Cancel</Button>
        <Button variant="contained" color="error" onClick={props.onConfirm} disabled={props.pending}>
          {props.confirmLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
