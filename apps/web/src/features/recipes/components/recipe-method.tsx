import type { RecipeView } from '@jarday/contracts';
import { formatAmount, type UnitSystem } from '@jarday/rules';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { formatDuration, PREP_KIND_LABELS } from '../utils/recipe-labels';

/** The prep steps in order, each with its timed duration. */
export function PrepStepList({ steps }: { steps: RecipeView['prepSteps'] }) {
  if (steps.length === 0) return <Typography sx={{ color: 'text.secondary' }}>No prep steps given.</Typography>;
  return (
    <Box component="ol" sx={{ m: 0, pl: 3, display: 'grid', gap: 1.5 }}>
      {steps.map((step, i) => (
        <li key={i}>
          <Typography component="span" sx={{ fontWeight: 500 }}>
            {PREP_KIND_LABELS[step.kind]}
            {step.seconds !== null ? ` · ${formatDuration(step.seconds)}` : ''}:
          </Typography>{' '}
          {step.label}
        </li>
      ))}
    </Box>
  );
}

/** Ingredients with amounts in the kitchen's units, rounded to what kitchen measures hold. */
export function IngredientList({ ingredients, units }: { ingredients: RecipeView['ingredients']; units: UnitSystem }) {
  if (ingredients.length === 0) {
    return (
      <Typography sx={{ color: 'text.secondary' }}>
        No ingredients listed: follow the published source for the amounts.
      </Typography>
    );
  }
  return (
    <Stack component="ul" spacing={1} sx={{ m: 0, pl: 2.5 }}>
      {ingredients.map((item, i) => (
        <li key={i}>
          {item.amount ? <strong>{formatAmount(item.amount, units).text} </strong> : null}
          {item.name}
          {item.note ? (
            <Typography component="span" sx={{ color: 'text.secondary' }}>{` (${item.note})`}</Typography>
          ) : null}
        </li>
      ))}
    </Stack>
  );
}
