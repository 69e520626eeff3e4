import ArrowBack from '@mui/icons-material/ArrowBack';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router-dom';

interface PageHeaderProps {
  title: ReactNode;
  subtitle?: ReactNode;
  back?: { to: string; label: string };
  actions?: ReactNode;
}

/** The one h1 of a page, with an optional way back and actions on the right. */
export function PageHeader({ title, subtitle, back, actions }: PageHeaderProps) {
  return (
    <Stack spacing={1} sx={{ mb: 3 }}>
      {back ? (
        <Button component={RouterLink} to={back.to} startIcon={<ArrowBack />} sx={{ alignSelf: 'flex-start', ml: -1 }}>
          {back.label}
        </Button>
      ) : null}
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', gap: 2, flexWrap: 'wrap' }}>
        <Stack spacing={0.5}>
          <Typography variant="h1">{title}</Typography>
          {subtitle ? (
            <Typography variant="body1" sx={{ color: 'text.secondary' }}>
              {subtitle}
            </Typography>
          ) : null}
        </Stack>
        {actions}
      </Stack>
    </Stack>
  );
}
