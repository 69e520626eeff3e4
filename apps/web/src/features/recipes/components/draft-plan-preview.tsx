import type { CannerView, KitchenView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { memo } from 'react';
import { usePlanChoice } from '../hooks/use-plan-choice';
import { draftRules, planLocally } from '../utils/local-plan';
import type { RecipeDraft } from '../utils/recipe-draft';
import { NoCanners } from './no-canners';
import { PlanChooser } from './plan-chooser';
import { PlanOutput } from './plan-output';

interface DraftPlanPreviewProps {
  draft: RecipeDraft;
  kitchen: KitchenView;
  canners: readonly CannerView[];
}

/**
 * The plan for the unsaved draft, worked out with the rules the server uses whenever the draft changes. It is
 * given a deferred copy of the draft and memoised, so it catches up just after a keystroke rather than during it.
 */
export const DraftPlanPreview = memo(function DraftPlanPreview({ draft, kitchen, canners }: DraftPlanPreviewProps) {
  const choice = usePlanChoice(
    { 'boiling-water': draft.boilingWater?.rows ?? null, pressure: draft.pressure?.rows ?? null },
    canners,
  );
  if (canners.length === 0) return <NoCanners kitchenId={kitchen.id} />;
  const rules = draftRules(draft);
  return (
    <Stack spacing={3}>
      <Typography sx={{ color: 'text.secondary' }}>
        Worked out as you type, for this kitchen&apos;s altitude and canners. Nothing is saved until you save.
      </Typography>
      <PlanChooser choice={choice} canners={canners} />
      {!rules.ok ? (
        <Alert severity="info" role="status">
          <AlertTitle>The plan shows once these are fixed</AlertTitle>
          <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
            {rules.problems.slice(0, 4).map((p) => (
              <li key={p}>{p}</li>
            ))}
          </Box>
        </Alert>
      ) : choice.row && choice.canner ? (
        <PlanOutput
          answer={planLocally({
            recipe: rules.recipe,
            category: draft.category,
            jarSize: choice.row.jarSize,
            pack: choice.row.pack,
            altitude: kitchen.altitude,
            canner: choice.canner,
          })}
          units={kitchen.units}
        />
      ) : null}
    </Stack>
  );
});
