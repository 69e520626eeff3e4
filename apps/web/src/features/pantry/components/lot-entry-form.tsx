import CardGiftcard from '@mui/icons-material/CardGiftcard';
import ReportProblem from '@mui/icons-material/ReportProblem';
import Restaurant from '@mui/icons-material/Restaurant';
import { createLotEntrySchema, type LotEntryAnswer, type LotEntryKind, type LotView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { useState, type FormEvent } from 'react';
import { numberOrUndefined, splitServerError, validate, type FieldErrors } from '../../../lib/form-errors';
import { useAddLotEntry } from '../api/add-lot-entry';
import { jarsWord, localToday } from '../utils/pantry-labels';
import { SpoilageCaution } from './spoilage-caution';

const FIELDS = ['jars', 'recipient', 'date', 'note'] as const;

const SUBMIT: Record<LotEntryKind, string> = {
  eaten: 'Record jars eaten',
  gift: 'Record the gift',
  spoiled: 'Report spoilage',
};

/**
 * The schema checks who a gift went to only once the fields themselves are valid; a second look with a valid count
 * and date finds that message too, so every mistake shows at once.
 */
function allErrors(values: Record<string, unknown>, errors: FieldErrors): FieldErrors {
  const again = validate(createLotEntrySchema, { ...values, jars: 1, date: localToday() });
  return again.ok ? errors : { ...again.errors, ...errors };
}

interface LotEntryFormProps {
  kitchenId: string;
  lot: LotView;
  onRecorded?: (answer: LotEntryAnswer) => void;
}

/** Jars that left the shelf: eaten, given away (to whom, when, how many) or reported spoiled. */
export function LotEntryForm({ kitchenId, lot, onRecorded }: LotEntryFormProps) {
  const [kind, setKind] = useState<LotEntryKind>('gift');
  const [jars, setJars] = useState('');
  const [recipient, setRecipient] = useState('');
  const [date, setDate] = useState(localToday);
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);
  const add = useAddLotEntry(kitchenId, lot.id);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setGeneral(null);
    const values = {
      kind,
      jars: numberOrUndefined(jars),
      recipient: kind === 'gift' && recipient.trim() ? recipient : undefined,
      date,
      note: note.trim() ? note : undefined,
    };
    const checked = validate(createLotEntrySchema, values);
    if (!checked.ok) return setErrors(allErrors(values, checked.errors));
    setErrors({});
    add.mutate(checked.data, {
      onSuccess: (answer) => {
        setJars('');
        setRecipient('');
        setNote('');
        onRecorded?.(answer);
      },
      onError: (error) => {
        const split = splitServerError(error, FIELDS);
        setErrors(split.fieldErrors);
        setGeneral(split.general);
      },
    });
  };

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2} aria-label="Jars off the shelf">
      <ToggleButtonGroup
        exclusive
        value={kind}
        onChange={(_, next: LotEntryKind | null) => {
          if (next) setKind(next);
          setErrors({});
        }}
        aria-label="What happened to the jars"
        sx={{
          display: 'grid',
          gridTemplateColumns: 'repeat(3, minmax(0, 1fr))',
          maxWidth: 560,
          '& .MuiToggleButton-root': { minHeight: 72, px: 1, gap: 0.5, flexDirection: { xs: 'column', sm: 'row' } },
        }}
      >
        <ToggleButton value="gift">
          <CardGiftcard aria-hidden /> Given away
        </ToggleButton>
        <ToggleButton value="eaten">
          <Restaurant aria-hidden /> Eaten
        </ToggleButton>
        <ToggleButton value="spoiled">
          <ReportProblem aria-hidden /> Spoiled
        </ToggleButton>
      </ToggleButtonGroup>
      {kind === 'spoiled' ? <SpoilageCaution /> : null}
      <Typography sx={{ color: 'text.secondary' }}>{jarsWord(lot.onShelf)} on the shelf.</Typography>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <TextField
          label="How many jars"
          value={jars}
          onChange={(e) => setJars(e.target.value)}
          error={Boolean(errors.jars)}
          helperText={errors.jars}
          slotProps={{ htmlInput: { inputMode: 'numeric' } }}
        />
        <TextField
          label="Date"
          type="date"
          value={date}
          onChange={(e) => setDate(e.target.value)}
          error={Boolean(errors.date)}
          helperText={errors.date}
          slotProps={{ inputLabel: { shrink: true } }}
        />
      </Stack>
      {kind === 'gift' ? (
        <TextField
          label="Given to"
          value={recipient}
          onChange={(e) => setRecipient(e.target.value)}
          error={Boolean(errors.recipient)}
          helperText={errors.recipient}
          autoComplete="off"
        />
      ) : null}
      <TextField
        label={kind === 'spoiled' ? 'What did you see? (optional)' : 'Note (optional)'}
        value={note}
        onChange={(e) => setNote(e.target.value)}
        error={Boolean(errors.note)}
        helperText={errors.note}
        multiline
        minRows={kind === 'spoiled' ? 2 : 1}
      />
      {general ? (
        <Alert severity="error" role="alert">
          {general}
        </Alert>
      ) : null}
      <Button
        type="submit"
        variant="contained"
        color={kind === 'spoiled' ? 'error' : 'primary'}
        disabled={add.isPending}
        sx={{ alignSelf: 'flex-start', minHeight: 64 }}
      >
        {add.isPending ? 'Saving…' : SUBMIT[kind]}
      </Button>
    </Stack>
  );
}
