import type { RecipeData } from '@jarday/contracts';
import { CAUTIONS, type CautionId } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';

/** Which standing cautions (USDA Guide 1; NCHFP; PNW 421; 21 CFR 114) bear on a recipe. */
export function cautionIdsFor(
  recipe: Pick<RecipeData, 'category' | 'productClass' | 'processing'>,
  hasDialCanner: boolean,
): CautionId[] {
  const ids: CautionId[] = ['tested-recipes'];
  if (recipe.category === 'salsa') ids.push('salsa-changes');
  if (recipe.productClass === 'low-acid' || recipe.processing.pressure) ids.push('low-acid-pressure');
  ids.push('altitude');
  if (recipe.processing.pressure && hasDialCanner) ids.push('dial-gauge-check');
  ids.push('hot-jars-steam', 'local-guidance');
  return ids;
}

/** The cautions for a recipe, in Jarday's order, each with its title and a sentence or two. */
export function RecipeCautions(props: {
  recipe: Pick<RecipeData, 'category' | 'productClass' | 'processing'>;
  hasDialCanner: boolean;
}) {
  return (
    <Alert severity="info" role="note">
      <AlertTitle>Before you can this</AlertTitle>
      <Box component="ul" sx={{ m: 0, pl: 2.5, display: 'grid', gap: 1 }}>
        {cautionIdsFor(props.recipe, props.hasDialCanner).map((id) => (
          <li key={id}>
            <strong>{CAUTIONS[id].title}.</strong> {CAUTIONS[id].text}
          </li>
        ))}
      </Box>
    </Alert>
  );
}

const BOX_CAUTIONS: CautionId[] = [
  'tested-recipes',
  'salsa-changes',
  'low-acid-pressure',
  'altitude',
  'dial-gauge-check',
  'local-guidance',
];

/** The cautions that govern choosing and changing recipes, for the Recipe box as a whole. */
export function RecipeBoxCautions() {
  return (
    <Alert severity="info" role="note">
      <AlertTitle>Working from recipes</AlertTitle>
      <Box component="ul" sx={{ m: 0, pl: 2.5, display: 'grid', gap: 1 }}>
        {BOX_CAUTIONS.map((id) => (
          <li key={id}>
            <strong>{CAUTIONS[id].title}.</strong> {CAUTIONS[id].text}
          </li>
        ))}
      </Box>
    </Alert>
  );
}
