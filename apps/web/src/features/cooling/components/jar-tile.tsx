import CheckCircle from '@mui/icons-material/CheckCircle';
import Dangerous from '@mui/icons-material/Dangerous';
import RadioButtonUnchecked from '@mui/icons-material/RadioButtonUnchecked';
import RemoveCircleOutlineRounded from '@mui/icons-material/RemoveCircleOutlineRounded';
import type { SealResult } from '@jarday/contracts';
import ButtonBase from '@mui/material/ButtonBase';
import Typography from '@mui/material/Typography';
import type { SxProps, Theme } from '@mui/material/styles';
import { SEAL_LABELS } from '../utils/seal-labels';

/** Each state has its own shape and word besides its colour: a tick, a ring with a gap, an octagon, an empty ring. */
const LOOKS: Record<SealResult | 'none', { icon: typeof CheckCircle; sx: SxProps<Theme> }> = {
  none: {
    icon: RadioButtonUnchecked,
    sx: { border: '3px dashed', borderColor: 'text.secondary', color: 'text.secondary', bgcolor: 'background.paper' },
  },
  sealed: {
    icon: CheckCircle,
    sx: { border: '3px solid', borderColor: 'primary.dark', bgcolor: 'primary.main', color: 'primary.contrastText' },
  },
  unsealed: {
    icon: RemoveCircleOutlineRounded,
    sx: { border: '5px solid', borderColor: 'secondary.main', bgcolor: 'background.paper', color: 'text.primary' },
  },
  broken: {
    icon: Dangerous,
    sx: { border: '3px solid', borderColor: 'error.main', bgcolor: 'error.main', color: 'error.contrastText' },
  },
};

interface JarTileProps {
  jarNumber: number;
  result: SealResult | null;
  disabled?: boolean;
  onTap: () => void;
}

/** One jar of a load as a large square to tap through its seal result. */
export function JarTile({ jarNumber, result, disabled = false, onTap }: JarTileProps) {
  const look = LOOKS[result ?? 'none'];
  const Icon = look.icon;
  const state = result ? SEAL_LABELS[result] : 'Not checked';
  return (
    <ButtonBase
      onClick={onTap}
      disabled={disabled}
      aria-label={`Jar ${jarNumber}: ${state.toLowerCase()}`}
      data-seal={result ?? 'none'}
      sx={
        [
          {
            minHeight: 104,
            minWidth: 96,
            borderRadius: '16px',
            flexDirection: 'column',
            gap: 0.5,
            p: 1,
            '&.Mui-disabled': { opacity: 0.75 },
          },
          look.sx,
        ] as SxProps<Theme>
      }
    >
      <Icon sx={{ fontSize: 36 }} aria-hidden />
      <Typography component="span" sx={{ fontSize: '1.15rem', fontWeight: 700, lineHeight: 1.1 }}>
        Jar {jarNumber}
      </Typography>
      <Typography component="span" sx={{ fontSize: '1rem', lineHeight: 1.1 }}>
        {state}
      </Typography>
    </ButtonBase>
  );
}
