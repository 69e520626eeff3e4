import type { CannerView } from '@jarday/contracts';
import Dialog from '@mui/material/Dialog';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useTheme } from '@mui/material/styles';
import { useId } from 'react';
import { CannerForm } from './canner-form';

/** The canner form in a dialog; full screen on a phone so the jar-size fields have room. */
export function CannerDialog(props: { kitchenId: string; canner?: CannerView; open: boolean; onClose: () => void }) {
  const titleId = useId();
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'));
  return (
    <Dialog
      open={props.open}
      onClose={props.onClose}
      aria-labelledby={titleId}
      fullWidth
      maxWidth="sm"
      fullScreen={phone}
    >
      <DialogTitle id={titleId}>{props.canner ? `Edit ${props.canner.name}` : 'Add a canner'}</DialogTitle>
      <DialogContent>
        {/* Keyed so reopening for another canner starts from that canner's values. */}
        <CannerForm
          key={props.canner?.id ?? 'new'}
          kitchenId={props.kitchenId}
          canner={props.canner}
          onSaved={props.onClose}
          onCancel={props.onClose}
        />
      </DialogContent>
    </Dialog>
  );
}
