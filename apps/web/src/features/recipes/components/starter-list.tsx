import ContentCopy from '@mui/icons-material/ContentCopy';
import type { RecipeView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardActions from '@mui/material/CardActions';
import CardContent from '@mui/material/CardContent';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { useCopyRecipe } from '../api/copy-recipe';
import { RecipeMeta } from './recipe-meta';
import { TestedStatus } from './untested-badge';

interface StarterListProps {
  kitchenId: string;
  starters: readonly RecipeView[];
  /** Leads may copy a starter into the kitchen. */
  canCopy: boolean;
  onCopied: (recipe: RecipeView) => void;
}

/** The built-in starters, written from published tables; a lead copies one to make it the kitchen's own. */
export function StarterList({ kitchenId, starters, canCopy, onCopied }: StarterListProps) {
  const copy = useCopyRecipe(kitchenId, { onSuccess: onCopied });
  return (
    <Stack component="ul" spacing={2} sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Starter recipes">
      {starters.map((starter) => {
        const copying = copy.isPending && copy.variables === starter.id;
        const failed = copy.isError && copy.variables === starter.id;
        return (
          <li key={starter.id}>
            <Card>
              <CardContent>
                <Stack spacing={1}>
                  <Link
                    component={RouterLink}
                    to={paths.starter(kitchenId, starter.id)}
                    variant="h3"
                    underline="hover"
                    sx={{ alignSelf: 'flex-start', py: 1 }}
                  >
                    {starter.name}
                  </Link>
                  <RecipeMeta recipe={starter} />
                  <Typography variant="body2">{starter.source?.citation}</Typography>
                  <Stack direction="row">
                    <TestedStatus tested={starter.tested} compact />
                  </Stack>
                  {failed ? <Alert severity="error">{copy.error.message}</Alert> : null}
                </Stack>
              </CardContent>
              {canCopy ? (
                <CardActions sx={{ px: 2, pb: 2 }}>
                  <Button
                    variant="outlined"
                    startIcon={<ContentCopy />}
                    disabled={copy.isPending}
                    onClick={() => copy.mutate(starter.id)}
                    aria-label={`Copy to my kitchen: ${starter.name}`}
                  >
                    {copying ? 'Copying…' : 'Copy to my kitchen'}
                  </Button>
                </CardActions>
              ) : null}
            </Card>
          </li>
        );
      })}
    </Stack>
  );
}
