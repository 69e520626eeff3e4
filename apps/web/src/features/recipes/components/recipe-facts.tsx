import type { RecipeView } from '@jarday/contracts';
import { acidPerJar, headspaceOf, JAR_SIZE_LABELS, JAR_SIZES } from '@jarday/rules';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { CATEGORY_LABELS, PRODUCT_CLASS_LABELS } from '../utils/recipe-labels';

function Row({ term, children }: { term: string; children: ReactNode }) {
  return (
    <Stack direction={{ xs: 'column', sm: 'row' }} sx={{ gap: { xs: 0, sm: 2 } }}>
      <Typography component="dt" sx={{ fontWeight: 500, minWidth: 170, flexShrink: 0 }}>
        {term}
      </Typography>
      <Typography component="dd" sx={{ m: 0, overflowWrap: 'anywhere' }}>
        {children}
      </Typography>
    </Stack>
  );
}

/** Per-jar acid for each jar size the tables name (USDA Guide 3 publishes pints and quarts). */
function Acidification({ recipe }: { recipe: RecipeView }) {
  if (recipe.acidification === null) return <>None added</>;
  const named = new Set(
    [...(recipe.processing.boilingWater?.rows ?? []), ...(recipe.processing.pressure?.rows ?? [])].map(
      (r) => r.jarSize,
    ),
  );
  return (
    <>
      Tomatoes: add bottled lemon juice or citric acid to each jar before filling.
      <Box component="ul" sx={{ m: 0, mt: 0.5, pl: 2.5 }}>
        {JAR_SIZES.filter((size) => named.has(size)).map((size) => (
          <li key={size}>
            {JAR_SIZE_LABELS[size]}: {(acidPerJar(recipe.acidification, size) ?? []).map((a) => a.text).join(', or ')}
          </li>
        ))}
      </Box>
    </>
  );
}

/** What kind of recipe it is and where it comes from: source, class, headspace, acid. */
export function RecipeFacts({ recipe }: { recipe: RecipeView }) {
  const headspace = headspaceOf(recipe.headspaceInches);
  return (
    <Stack component="dl" spacing={1.5} sx={{ m: 0 }}>
      <Row term="Source">
        {recipe.source ? (
          <>
            {recipe.source.citation}
            {recipe.source.url ? (
              <>
                {' '}
                <Link href={recipe.source.url} target="_blank" rel="noopener noreferrer">
                  (open the source)
                </Link>
              </>
            ) : null}
          </>
        ) : (
          'No source given'
        )}
      </Row>
      <Row term="Category">{CATEGORY_LABELS[recipe.category]}</Row>
      <Row term="Product class">{PRODUCT_CLASS_LABELS[recipe.productClass]}</Row>
      <Row term="Headspace">{headspace.label}</Row>
      <Row term="Acidification">
        <Acidification recipe={recipe} />
      </Row>
    </Stack>
  );
}
