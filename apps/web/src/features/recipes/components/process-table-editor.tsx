import type { RecipeData } from '@jarday/contracts';
import type { ProductClass } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import FormHelperText from '@mui/material/FormHelperText';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { memo, useCallback, useState } from 'react';
import type { FieldErrors } from '../../../lib/form-errors';
import type { EditDraft } from '../hooks/use-recipe-draft';
import {
  emptyDraft,
  emptyPressureRow,
  processingOf,
  type BoilingWaterDraft,
  type PressureRowDraft,
  type RecipeDraft,
} from '../utils/recipe-draft';
import { sameValue } from '../utils/same-value';
import { BoilingWaterTableEditor } from './boiling-water-table-editor';
import { PressureTableEditor } from './pressure-table-editor';

interface ProcessTableEditorProps extends Pick<RecipeDraft, 'boilingWater' | 'pressure'> {
  productClass: ProductClass;
  errors: FieldErrors;
  edit: EditDraft;
  /** The saved tables when editing a tested recipe: changing them makes it untested on save. */
  testedProcessing?: RecipeData['processing'];
}

/** Warns before a tested recipe's times are changed; the server marks such a save untested. */
function TestedTimesWarning({ changed }: { changed: boolean }) {
  return changed ? (
    <Alert severity="warning" role="alert">
      <AlertTitle>Saving changed times marks this recipe untested</AlertTitle>
      You changed the process table of a tested recipe. Its source tested only the times it published, so once saved
      this recipe is no longer a tested one.
    </Alert>
  ) : (
    <Alert severity="info" role="note">
      This is a tested recipe. Changing any band, row or time makes it untested when you save.
    </Alert>
  );
}

/** Which canners the recipe was tested for, and the editor for each table. */
export const ProcessTableEditor = memo(function ProcessTableEditor(props: ProcessTableEditorProps) {
  const { boilingWater, pressure, productClass, errors, edit, testedProcessing } = props;
  // A table switched off is kept here, so switching it back on does not lose what was typed.
  const [stash, setStash] = useState<Pick<RecipeDraft, 'boilingWater' | 'pressure'>>({
    boilingWater: null,
    pressure: null,
  });
  const changed =
    testedProcessing !== undefined && !sameValue(processingOf({ boilingWater, pressure }), testedProcessing);

  const toggleBoiling = (on: boolean) => {
    if (!on) setStash((s) => ({ ...s, boilingWater }));
    edit('processing', (d) => ({ ...d, boilingWater: on ? (stash.boilingWater ?? emptyDraft().boilingWater) : null }));
  };
  const togglePressure = (on: boolean) => {
    if (!on) setStash((s) => ({ ...s, pressure }));
    edit('processing', (d) => ({ ...d, pressure: on ? (stash.pressure ?? { rows: [emptyPressureRow()] }) : null }));
  };
  const editBoiling = useCallback(
    (touch: string | null, change: (t: BoilingWaterDraft) => BoilingWaterDraft) =>
      edit(touch, (d) => (d.boilingWater ? { ...d, boilingWater: change(d.boilingWater) } : d)),
    [edit],
  );
  const editPressure = useCallback(
    (touch: string | null, change: (rows: PressureRowDraft[]) => PressureRowDraft[]) =>
      edit(touch, (d) => (d.pressure ? { ...d, pressure: { rows: change(d.pressure.rows) } } : d)),
    [edit],
  );

  return (
    <Stack spacing={3}>
      {testedProcessing ? <TestedTimesWarning changed={changed} /> : null}
      <Stack component="fieldset" sx={{ border: 0, p: 0, m: 0 }}>
        <Typography component="legend" variant="h4" sx={{ mb: 1 }}>
          Tested for
        </Typography>
        <FormGroup row>
          <FormControlLabel
            control={<Checkbox checked={boilingWater !== null} onChange={(e) => toggleBoiling(e.target.checked)} />}
            label="Boiling-water canner"
          />
          <FormControlLabel
            control={<Checkbox checked={pressure !== null} onChange={(e) => togglePressure(e.target.checked)} />}
            label="Pressure canner"
          />
        </FormGroup>
        {errors.processing ? <FormHelperText error>{errors.processing}</FormHelperText> : null}
      </Stack>
      {productClass === 'low-acid' ? (
        <Alert severity="warning" role="note">
          Low-acid foods must be processed in a pressure canner: a boiling-water canner cannot make them safe.
        </Alert>
      ) : null}
      {boilingWater ? (
        <Stack component="section" spacing={2} aria-label="Boiling-water table">
          <Typography variant="h3">Boiling-water table</Typography>
          {errors['processing.boilingWater'] ? (
            <Alert severity="error">{errors['processing.boilingWater']}</Alert>
          ) : null}
          <BoilingWaterTableEditor table={boilingWater} errors={errors} onChange={editBoiling} />
        </Stack>
      ) : null}
      {pressure ? (
        <Stack component="section" spacing={2} aria-label="Pressure table">
          <Typography variant="h3">Pressure table</Typography>
          {errors['processing.pressure'] ? <Alert severity="error">{errors['processing.pressure']}</Alert> : null}
          <PressureTableEditor rows={pressure.rows} errors={errors} onChange={editPressure} />
        </Stack>
      ) : null}
    </Stack>
  );
});
