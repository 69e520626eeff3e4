import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

/** A narrow card for sign-in, registration and joining, with the page's h1. */
export function CenteredCard({ title, intro, children }: { title: string; intro?: ReactNode; children: ReactNode }) {
  return (
    <Card sx={{ maxWidth: 520, mx: 'auto' }}>
      <CardContent sx={{ p: { xs: 3, sm: 4 } }}>
        <Stack spacing={3}>
          <Stack spacing={1}>
            <Typography variant="h1">{title}</Typography>
            {intro ? <Typography sx={{ color: 'text.secondary' }}>{intro}</Typography> : null}
          </Stack>
          {children}
        </Stack>
      </CardContent>
    </Card>
  );
}
