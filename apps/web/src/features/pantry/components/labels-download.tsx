import Print from '@mui/icons-material/Print';
import { LABEL_SHEETS, type LabelSheet, type LotView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useDownloadLabels } from '../api/download-labels';
import { SHEET_LABELS } from '../utils/pantry-labels';

/** The printable labels of a lot: one per sealed jar, with the product, the day, the load and a code to its record. */
export function LabelsDownload({ kitchenId, lot }: { kitchenId: string; lot: LotView }) {
  const [sheet, setSheet] = useState<LabelSheet>('letter-rect-2x4');
  const download = useDownloadLabels(kitchenId, lot.id, lot.code);
  return (
    <Stack spacing={2}>
      <Typography>
        A label for each sealed jar: the product, the canning day, the load and a code that opens the jar&apos;s record.
        Print at actual size.
      </Typography>
      <TextField select label="Label sheet" value={sheet} onChange={(e) => setSheet(e.target.value as LabelSheet)}>
        {LABEL_SHEETS.map((s) => (
          <MenuItem key={s} value={s}>
            {SHEET_LABELS[s]}
          </MenuItem>
        ))}
      </TextField>
      {download.isError ? (
        <Alert severity="error" role="alert">
          {download.error.message}
        </Alert>
      ) : null}
      <Button
        variant="contained"
        startIcon={<Print />}
        disabled={download.isPending}
        onClick={() => download.mutate(sheet)}
        sx={{ alignSelf: 'flex-start', minHeight: 64 }}
      >
        {download.isPending ? 'Making the labels…' : 'Download labels (PDF)'}
      </Button>
    </Stack>
  );
}
