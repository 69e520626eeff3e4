import type { PantrySummaryView } from '@jarday/contracts';
import { JAR_SIZE_LABELS } from '@jarday/rules';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { jarsWord } from '../utils/pantry-labels';

/** Jars on the shelf across the kitchen, by size. */
export function PantrySummary({ summary }: { summary: PantrySummaryView }) {
  return (
    <Stack spacing={1} data-testid="pantry-summary">
      <Typography sx={{ fontSize: '1.5rem' }}>
        <strong>{jarsWord(summary.onShelf)}</strong> on the shelf in {summary.lots}{' '}
        {summary.lots === 1 ? 'lot' : 'lots'}
      </Typography>
      {summary.bySize.length > 0 ? (
        <Typography sx={{ color: 'text.secondary' }}>
          {summary.bySize.map((s) => `${s.onShelf} ${JAR_SIZE_LABELS[s.jarSize].toLowerCase()}`).join(' · ')}
        </Typography>
      ) : null}
      {summary.flaggedLots > 0 ? (
        <Typography sx={{ color: 'error.main', fontWeight: 700 }}>
          {summary.flaggedLots} {summary.flaggedLots === 1 ? 'lot has' : 'lots have'} a spoilage report: look at those
          jars before opening any.
        </Typography>
      ) : null}
    </Stack>
  );
}
