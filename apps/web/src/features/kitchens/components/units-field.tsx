import { UNIT_SYSTEMS, type UnitSystem } from '@jarday/rules';
import { ChoiceField } from '../../../components/ui/choice-field';

const LABELS: Record<UnitSystem, string> = {
  us: 'US customary (lb, °F, inches)',
  metric: 'Metric (kg, °C, cm)',
};

/** Which units the kitchen reads weights and temperatures in. */
export function UnitsField(props: { value: UnitSystem; onChange: (units: UnitSystem) => void; error?: string }) {
  return (
    <ChoiceField
      label="Preferred units"
      value={props.value}
      options={UNIT_SYSTEMS.map((value) => ({ value, label: LABELS[value] }))}
      onChange={props.onChange}
      error={props.error}
    />
  );
}
