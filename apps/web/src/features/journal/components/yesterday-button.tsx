import History from '@mui/icons-material/History';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import Stack from '@mui/material/Stack';
import { Link as RouterLink } from 'react-router-dom';
import { useYesterday } from '../api/journal-api';
import { pastDayFigures } from './past-day-list';

/** The kitchen home's one tap to the latest closed day's journal; nothing until a day has been closed. */
export function YesterdayButton({ kitchenId, href }: { kitchenId: string; href: (dayId: string) => string }) {
  const yesterday = useYesterday(kitchenId);
  const day = yesterday.data?.day;
  if (!day) return null;
  return (
    <Stack spacing={1}>
      <Button
        component={RouterLink}
        to={href(day.id)}
        variant="contained"
        color="secondary"
        size="large"
        startIcon={<History />}
        sx={{ minHeight: 72, fontSize: '1.25rem', alignSelf: 'stretch' }}
      >
        Yesterday&apos;s day: {day.title}
      </Button>
      <Typography variant="body2" sx={{ color: 'text.secondary' }}>
        {day.date} · {pastDayFigures(day)}
      </Typography>
    </Stack>
  );
}
