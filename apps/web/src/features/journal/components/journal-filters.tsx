import type { JournalQuery, JournalView } from '@jarday/contracts';
import { ENTRY_KINDS } from '@jarday/live';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { KIND_LABELS } from '../utils/journal-words';

interface Option {
  value: string | undefined;
  label: string;
}

function ChipRow({
  title,
  options,
  chosen,
  onChoose,
}: {
  title: string;
  options: Option[];
  chosen: string | undefined;
  onChoose: (v: string | undefined) => void;
}) {
  return (
    <Stack spacing={1} role="group" aria-label={title}>
      <Typography variant="body2" sx={{ color: 'text.secondary', fontWeight: 500 }}>
        {title}
      </Typography>
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
        {options.map((o) => {
          const on = o.value === chosen;
          return (
            <Chip
              key={o.value ?? 'all'}
              label={o.label}
              clickable
              color={on ? 'primary' : 'default'}
              variant={on ? 'filled' : 'outlined'}
              aria-pressed={on}
              onClick={() => onChoose(o.value)}
              sx={{ minHeight: 52, fontSize: '1.0625rem', px: 1, borderRadius: 26 }}
            />
          );
        })}
      </Stack>
    </Stack>
  );
}

/** Big chips to narrow the journal by station, load and kind; "All" clears each. */
export function JournalFilters({
  view,
  filter,
  onChange,
}: {
  view: JournalView;
  filter: JournalQuery;
  onChange: (next: JournalQuery) => void;
}) {
  const all: Option = { value: undefined, label: 'All' };
  return (
    <Stack spacing={2}>
      <ChipRow
        title="Station"
        options={[all, ...view.stations.map((s) => ({ value: s.key, label: s.label }))]}
        chosen={filter.station}
        onChoose={(station) => onChange({ ...filter, station })}
      />
      <ChipRow
        title="Load"
        options={[all, ...view.loads.map((l) => ({ value: l.id, label: l.label }))]}
        chosen={filter.loadId}
        onChoose={(loadId) => onChange({ ...filter, loadId })}
      />
      <ChipRow
        title="Kind"
        options={[all, ...ENTRY_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k] }))]}
        chosen={filter.kind}
        onChoose={(kind) => onChange({ ...filter, kind: kind as JournalQuery['kind'] })}
      />
    </Stack>
  );
}
