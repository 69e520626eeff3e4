import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

interface StationCardProps {
  title: string;
  icon: ReactNode;
  subtitle?: ReactNode;
  /** A station where something needs a person now gets a thick apricot edge, besides its words and bell. */
  attention?: boolean;
  children: ReactNode;
  testId?: string;
}

/** One station of the counter (a canner, the prep board, the stove, the jars, the cooling shelf). */
export function StationCard({ title, icon, subtitle, attention = false, children, testId }: StationCardProps) {
  return (
    <Paper
      component="section"
      aria-label={title}
      data-testid={testId}
      variant="outlined"
      sx={{
        p: { xs: 2, md: 2.5 },
        borderRadius: 4,
        borderWidth: attention ? 4 : 1,
        borderColor: attention ? 'secondary.main' : 'divider',
        minWidth: 0,
      }}
    >
      <Stack spacing={2}>
        <Stack direction="row" spacing={1.5} sx={{ alignItems: 'center' }}>
          <Box aria-hidden sx={{ display: 'flex', fontSize: 36, color: 'primary.main' }}>
            {icon}
          </Box>
          <Box sx={{ minWidth: 0 }}>
            <Typography variant="h2" sx={{ fontSize: '1.6rem' }}>
              {title}
            </Typography>
            {subtitle ? (
              <Typography sx={{ color: 'text.secondary', fontSize: '1.05rem' }}>{subtitle}</Typography>
            ) : null}
          </Box>
        </Stack>
        {children}
      </Stack>
    </Paper>
  );
}
