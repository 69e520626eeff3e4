import type { JournalEntryView } from '@jarday/contracts';
import WarningAmber from '@mui/icons-material/WarningAmber';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { clockSeconds } from '../utils/journal-words';

/** "Tablet 528a5c14": devices are known by the start of their id; the server's own entries have none. */
const deviceName = (deviceId: string | null) => (deviceId ? `device ${deviceId.slice(0, 8)}` : 'the server');

/** The entries oldest first: time, who, which device, and what happened in plain words; overrides stand out. */
export function EntryList({ entries }: { entries: readonly JournalEntryView[] }) {
  if (entries.length === 0) return <Typography>No entry matches these filters.</Typography>;
  return (
    <Stack component="ol" spacing={0} sx={{ listStyle: 'none', m: 0, p: 0 }} aria-label="Journal entries">
      {entries.map((e) => {
        const warn = e.kind === 'override';
        return (
          <Box
            component="li"
            key={e.seq}
            sx={{
              display: 'grid',
              gridTemplateColumns: { xs: '1fr', sm: '6.5rem 1fr' },
              gap: { xs: 0, sm: 2 },
              py: 1.5,
              px: warn ? 1.5 : 0,
              borderBottom: 1,
              borderColor: 'divider',
              ...(warn ? { bgcolor: 'rgba(138, 75, 18, 0.08)', borderLeft: 4, borderLeftColor: 'warning.main' } : {}),
            }}
          >
            <Typography sx={{ fontVariantNumeric: 'tabular-nums', fontWeight: 500 }}>
              {clockSeconds(Date.parse(e.at))}
            </Typography>
            <Stack spacing={0.25}>
              <Typography sx={warn ? { color: 'warning.main', fontWeight: 700 } : undefined}>
                {warn ? (
                  <WarningAmber fontSize="small" sx={{ verticalAlign: 'text-bottom', mr: 0.5 }} aria-hidden />
                ) : null}
                {e.text}
              </Typography>
              <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                {e.actor?.name ?? 'Jarday'} on {deviceName(e.deviceId)} · {e.stationLabel}
                {e.loadNumber === null ? '' : ` · Load ${e.loadNumber}`}
              </Typography>
            </Stack>
          </Box>
        );
      })}
    </Stack>
  );
}
