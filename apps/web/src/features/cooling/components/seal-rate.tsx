import type { SealRate } from '@jarday/contracts';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';

/** The day's seal rate: sealed jars out of those checked so far (a reprocessed jar counts each time it is checked). */
export function SealRateLine({ rate, label }: { rate: SealRate; label: string }) {
  if (rate.checked === 0 || rate.rate === null) {
    return <Typography sx={{ color: 'text.secondary', fontSize: '1.1rem' }}>No seals checked yet.</Typography>;
  }
  const percent = Math.round(rate.rate * 100);
  return (
    <Stack spacing={0.75} sx={{ maxWidth: 480 }}>
      <Typography sx={{ fontSize: '1.25rem' }} data-testid="seal-rate">
        <strong>{percent}% sealed</strong> · {rate.sealed} of {rate.checked} jars checked
      </Typography>
      <LinearProgress
        variant="determinate"
        value={percent}
        aria-label={`${label}: ${percent}% of checked jars sealed`}
        sx={{ height: 12, borderRadius: 6 }}
      />
    </Stack>
  );
}
