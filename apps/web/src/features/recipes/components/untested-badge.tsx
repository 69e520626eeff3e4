import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Chip from '@mui/material/Chip';
import Verified from '@mui/icons-material/Verified';

/**
 * Shown wherever a recipe not marked tested appears. USDA Guide 1 recommends only tested recipes, processes and
 * times; the local extension service is the place to ask about anything else.
 */
export function UntestedBadge({ compact = false }: { compact?: boolean }) {
  return (
    <Alert severity="warning" role="note" sx={compact ? { py: 0.25, px: 1.5 } : undefined}>
      <AlertTitle sx={compact ? { mb: 0 } : undefined}>Not a tested recipe</AlertTitle>
      Its times were not checked by a recognised source. Can with tested recipes, and ask your local extension service
      before you rely on this one.
    </Alert>
  );
}

/** The quiet counterpart for a recipe marked tested by its source. */
export function TestedChip() {
  return <Chip icon={<Verified />} label="Tested recipe" color="success" variant="outlined" />;
}

/** The badge or the chip, whichever applies. */
export function TestedStatus({ tested, compact }: { tested: boolean; compact?: boolean }) {
  return tested ? <TestedChip /> : <UntestedBadge compact={compact} />;
}
