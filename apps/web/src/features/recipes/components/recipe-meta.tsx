import type { RecipeView } from '@jarday/contracts';
import Typography from '@mui/material/Typography';
import { CATEGORY_LABELS, jarSizesOf, METHOD_NAMES, methodsOf } from '../utils/recipe-labels';

/** "Tomatoes · Boiling-water canner · Pint, Quart". */
export function RecipeMeta({ recipe }: { recipe: RecipeView }) {
  const parts = [
    CATEGORY_LABELS[recipe.category],
    methodsOf(recipe.processing)
      .map((m) => METHOD_NAMES[m])
      .join(' or '),
    jarSizesOf(recipe.processing).join(', '),
  ];
  return (
    <Typography variant="body2" sx={{ color: 'text.secondary' }}>
      {parts.join(' · ')}
    </Typography>
  );
}
