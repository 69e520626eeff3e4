import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import Radio from '@mui/material/Radio';
import RadioGroup from '@mui/material/RadioGroup';
import { useId } from 'react';

interface ChoiceFieldProps<T extends string> {
  label: string;
  value: T | '';
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
  error?: string;
  hint?: string;
}

/** A labelled group of large radio buttons. */
export function ChoiceField<T extends string>({ label, value, options, onChange, error, hint }: ChoiceFieldProps<T>) {
  const labelId = useId();
  const hintId = useId();
  return (
    <FormControl component="fieldset" error={Boolean(error)}>
      <FormLabel component="legend" id={labelId}>
        {label}
      </FormLabel>
      <RadioGroup
        row
        aria-labelledby={labelId}
        aria-describedby={error || hint ? hintId : undefined}
        value={value}
        onChange={(e) => onChange(e.target.value as T)}
      >
        {options.map((o) => (
          <FormControlLabel key={o.value} value={o.value} control={<Radio />} label={o.label} />
        ))}
      </RadioGroup>
      {error || hint ? <FormHelperText id={hintId}>{error ?? hint}</FormHelperText> : null}
    </FormControl>
  );
}
