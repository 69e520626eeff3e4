import type { RecipeView } from '@jarday/contracts';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { RecipeMeta } from './recipe-meta';
import { TestedChip, UntestedBadge } from './untested-badge';

/** The kitchen's own recipes, each a large card that opens it; an untested one carries its badge. */
export function RecipeList({ kitchenId, recipes }: { kitchenId: string; recipes: readonly RecipeView[] }) {
  if (recipes.length === 0) {
    return (
      <Typography sx={{ color: 'text.secondary' }}>
        No recipes yet. Copy a starter below, or write one of your own from a tested source.
      </Typography>
    );
  }
  return (
    <Stack component="ul" spacing={2} sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Kitchen recipes">
      {recipes.map((recipe) => (
        <li key={recipe.id}>
          <Card>
            <CardActionArea component={RouterLink} to={paths.recipe(kitchenId, recipe.id)} sx={{ minHeight: 88 }}>
              <CardContent>
                <Stack
                  direction={{ xs: 'column', sm: 'row' }}
                  sx={{ gap: 1.5, justifyContent: 'space-between', alignItems: { sm: 'center' } }}
                >
                  <Stack spacing={0.5}>
                    <Typography variant="h3" component="h3">
                      {recipe.name}
                    </Typography>
                    <RecipeMeta recipe={recipe} />
                  </Stack>
                  {recipe.tested ? <TestedChip /> : null}
                </Stack>
              </CardContent>
            </CardActionArea>
            {recipe.tested ? null : (
              <CardContent sx={{ pt: 0 }}>
                <UntestedBadge compact />
              </CardContent>
            )}
          </Card>
        </li>
      ))}
    </Stack>
  );
}
