import DarkMode from '@mui/icons-material/DarkMode';
import LightMode from '@mui/icons-material/LightMode';
import IconButton from '@mui/material/IconButton';
import { useColorScheme } from '@mui/material/styles';

/** Switches between the light and the dim-kitchen scheme; MUI keeps the choice in localStorage. */
export function ColorModeToggle() {
  const { mode, systemMode, setMode } = useColorScheme();
  const current = mode === 'system' ? systemMode : mode;
  const dark = current === 'dark';
  return (
    <IconButton
      color="inherit"
      onClick={() => setMode(dark ? 'light' : 'dark')}
      aria-label={dark ? 'Use the light colours' : 'Use the dark colours'}
    >
      {dark ? <LightMode /> : <DarkMode />}
    </IconButton>
  );
}
