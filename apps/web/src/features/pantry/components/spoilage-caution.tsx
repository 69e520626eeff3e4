import type { CautionView } from '@jarday/contracts';
import { CAUTIONS } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Typography from '@mui/material/Typography';

/**
 * The botulism caution of a spoilage report: do not taste, how to dispose of the jars, and look at every other jar
 * of the lot (USDA Complete Guide to Home Canning, Guide 1). The server's copy is shown when it sent one.
 */
export function SpoilageCaution({ caution, flaggedNote }: { caution?: CautionView | null; flaggedNote?: string }) {
  const shown = caution ?? CAUTIONS['spoiled-lot'];
  return (
    <Alert severity="error" role="alert" data-testid="spoilage-caution" sx={{ fontSize: '1.1rem' }}>
      <AlertTitle sx={{ fontSize: '1.3rem', fontWeight: 700 }}>{shown.title}</AlertTitle>
      {flaggedNote ? <Typography sx={{ fontWeight: 700, mb: 1 }}>{flaggedNote}</Typography> : null}
      {shown.text}
      {shown.source ? (
        <Typography component="span" sx={{ display: 'block', fontSize: '0.9rem', mt: 1 }}>
          Source: {shown.source}
        </Typography>
      ) : null}
    </Alert>
  );
}
