import { bandsOffSchema, type CoolingLoadView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useId, useState, type FormEvent } from 'react';
import { splitServerError, validate } from '../../../lib/form-errors';
import { useTakeBandsOff } from '../api/take-bands-off';

interface BandsOverrideDialogProps {
  kitchenId: string;
  load: CoolingLoadView;
  /** The server's refusal, repeated so the lead reads what is being overridden. */
  refusal: string | null;
  onClose: () => void;
  onDone: () => void;
}

const REASON = 'override.reason';

/** A lead takes the bands off before 12 hours: only with a written reason, which the journal keeps. */
export function BandsOverrideDialog({ kitchenId, load, refusal, onClose, onDone }: BandsOverrideDialogProps) {
  const titleId = useId();
  const [reason, setReason] = useState('');
  const [fieldError, setFieldError] = useState<string | undefined>();
  const [general, setGeneral] = useState<string | null>(null);
  const take = useTakeBandsOff(kitchenId, load.loadId);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const checked = validate(bandsOffSchema, { override: { reason } });
    if (!checked.ok) return setFieldError(checked.errors[REASON] ?? checked.errors.form);
    setFieldError(undefined);
    setGeneral(null);
    take.mutate(checked.data, {
      onSuccess: onDone,
      onError: (error) => {
        const split = splitServerError(error, [REASON]);
        setFieldError(split.fieldErrors[REASON]);
        setGeneral(split.general);
      },
    });
  };

  return (
    <Dialog open onClose={onClose} aria-labelledby={titleId} fullWidth maxWidth="sm">
      <form noValidate onSubmit={submit}>
        <DialogTitle id={titleId}>Take the bands off load {load.number} early?</DialogTitle>
        <DialogContent>
          <Stack spacing={2}>
            <Alert severity="warning" role="note">
              <AlertTitle>The jars have not cooled 12 hours</AlertTitle>
              Lids can still be sealing. Moving the jars or pulling the bands now can break a seal that has not set, and
              a jar that unseals later can spoil unseen. Check every seal again before storing.
            </Alert>
            {refusal ? <Alert severity="info">{refusal}</Alert> : null}
            <TextField
              label="Why now? (kept in the journal)"
              value={reason}
              onChange={(e) => setReason(e.target.value)}
              multiline
              minRows={2}
              autoFocus
              error={Boolean(fieldError)}
              helperText={fieldError ?? 'At least a few words, e.g. the jars must move for the next load.'}
            />
            {general ? (
              <Alert severity="error" role="alert">
                {general}
              </Alert>
            ) : null}
          </Stack>
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 3, gap: 1, flexWrap: 'wrap' }}>
          <Button onClick={onClose}>Keep them on</Button>
          <Button type="submit" variant="contained" color="warning" disabled={take.isPending}>
            {take.isPending ? 'Taking them off…' : 'Take the bands off early'}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
