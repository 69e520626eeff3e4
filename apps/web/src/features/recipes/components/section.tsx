import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, type ReactNode } from 'react';

/** A titled part of a recipe page; the heading names the section for screen readers. */
export function Section({ title, children, action }: { title: string; children: ReactNode; action?: ReactNode }) {
  const id = useId();
  return (
    <Stack component="section" spacing={2} aria-labelledby={id}>
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', gap: 2, flexWrap: 'wrap' }}>
        <Typography id={id} variant="h2">
          {title}
        </Typography>
        {action}
      </Stack>
      {children}
    </Stack>
  );
}
