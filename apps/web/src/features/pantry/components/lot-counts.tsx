import type { LotView } from '@jarday/contracts';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';

/** The lot's jars at a glance, in large figures: sealed, on the shelf, eaten, given, spoiled. */
export function LotCounts({ lot }: { lot: LotView }) {
  const figures: [string, string, number][] = [
    ['on-shelf', 'On the shelf', lot.onShelf],
    ['sealed', 'Sealed', lot.sealed],
    ['eaten', 'Eaten', lot.eaten],
    ['given', 'Given away', lot.given],
    ['spoiled', 'Spoiled', lot.spoiled],
  ];
  return (
    <Box
      component="dl"
      sx={{ m: 0, display: 'grid', gap: 1.5, gridTemplateColumns: 'repeat(auto-fill, minmax(104px, 1fr))' }}
    >
      {figures.map(([key, label, value]) => (
        <Box
          key={key}
          data-testid={`count-${key}`}
          sx={{ border: 1, borderColor: 'divider', borderRadius: '14px', p: 1.5, bgcolor: 'background.paper' }}
        >
          <Typography component="dt" sx={{ color: 'text.secondary', fontSize: '1rem' }}>
            {label}
          </Typography>
          <Typography component="dd" sx={{ m: 0, fontSize: '2rem', fontWeight: 700, lineHeight: 1.2 }}>
            {value}
          </Typography>
        </Box>
      ))}
    </Box>
  );
}
