import type { LotEntryView } from '@jarday/contracts';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { calendarDate, ENTRY_LABELS, jarsWord } from '../utils/pantry-labels';

/** The lot's book: what left the shelf, newest first. */
export function LotEntries({ entries }: { entries: readonly LotEntryView[] }) {
  if (entries.length === 0) {
    return <Typography sx={{ color: 'text.secondary' }}>No jar has left the shelf yet.</Typography>;
  }
  const sorted = [...entries].sort((a, b) => b.date.localeCompare(a.date) || b.createdAt.localeCompare(a.createdAt));
  return (
    <Box
      component="ul"
      aria-label="Jars off the shelf"
      sx={{ m: 0, p: 0, listStyle: 'none', display: 'grid', gap: 1.5 }}
    >
      {sorted.map((e) => (
        <Box
          component="li"
          key={e.id}
          sx={{ borderLeft: 6, borderColor: e.kind === 'spoiled' ? 'error.main' : 'primary.light', pl: 1.5 }}
        >
          <Typography sx={{ fontWeight: 700 }}>
            {calendarDate(e.date)}: {jarsWord(e.jars)} {ENTRY_LABELS[e.kind].toLowerCase()}
            {e.kind === 'gift' && e.recipient ? ` to ${e.recipient}` : ''}
          </Typography>
          {e.note ? <Typography>{e.note}</Typography> : null}
          <Typography sx={{ color: 'text.secondary', fontSize: '1rem' }}>Written by {e.byName}</Typography>
        </Box>
      ))}
    </Box>
  );
}
