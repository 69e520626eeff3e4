import VolumeOff from '@mui/icons-material/VolumeOff';
import VolumeUp from '@mui/icons-material/VolumeUp';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useSoundStore } from '../stores/sound-store';
import { unlockSound } from '../utils/alarm-sound';

/**
 * Browsers keep sound off until someone taps the page. Until then the board says so and offers the tap; after it,
 * a quiet "Sound on" (and the chime) shows that alarms will be heard.
 */
export function SoundSwitch({ dense = false }: { dense?: boolean }) {
  const { checked, unlocked, failed } = useSoundStore();
  if (!checked) return null;
  if (failed && unlocked) {
    return (
      <Typography role="status" sx={{ color: 'warning.main', fontWeight: 700 }}>
        This device could not play the alarm: watch the screen.
      </Typography>
    );
  }
  if (unlocked) {
    return (
      <Stack
        direction="row"
        spacing={1}
        role="status"
        aria-label="Sound on"
        sx={{ alignItems: 'center', color: 'text.secondary' }}
      >
        <VolumeUp aria-hidden />
        <Box component="span" sx={dense ? { display: { xs: 'none', sm: 'inline' } } : undefined}>
          Sound on
        </Box>
      </Stack>
    );
  }
  return (
    <Button
      variant="contained"
      color="secondary"
      startIcon={<VolumeOff />}
      onClick={() => void unlockSound()}
      sx={{ minHeight: 64, fontSize: dense ? '1.05rem' : '1.25rem', fontWeight: 700 }}
    >
      Tap to turn sound on
    </Button>
  );
}
