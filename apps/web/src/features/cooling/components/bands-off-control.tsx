import type { CoolingLoadView, Role } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useTakeBandsOff } from '../api/take-bands-off';
import { clockAt } from '../utils/shelf-times';
import { BandsOverrideDialog } from './bands-override-dialog';

interface BandsOffControlProps {
  kitchenId: string;
  load: CoolingLoadView;
  role: Role;
}

/**
 * The big "bands off" button of a load. The server decides: before 12 hours it refuses and its reason is shown as
 * it comes; a lead may then take them off anyway with a written reason, which goes into the journal.
 */
export function BandsOffControl({ kitchenId, load, role }: BandsOffControlProps) {
  const take = useTakeBandsOff(kitchenId, load.loadId);
  const [refusal, setRefusal] = useState<string | null>(null);
  const [overriding, setOverriding] = useState(false);

  if (load.bandsOffAt) {
    return (
      <Stack spacing={0.5}>
        <Typography sx={{ fontSize: '1.25rem', fontWeight: 700 }}>Bands off at {clockAt(load.bandsOffAt)}</Typography>
        {load.bandsOffOverride ? (
          <Typography sx={{ color: 'text.secondary' }}>
            Taken off early by a lead. Reason: {load.bandsOffOverride}
          </Typography>
        ) : null}
      </Stack>
    );
  }
  if (role === 'watcher') {
    return (
      <Typography sx={{ color: 'text.secondary' }}>
        A helper or a lead takes the bands off and checks the seals.
      </Typography>
    );
  }

  const press = () => {
    setRefusal(null);
    take.mutate({}, { onError: (error) => setRefusal(error.message) });
  };

  return (
    <Stack spacing={1.5}>
      <Button
        variant="contained"
        size="large"
        onClick={press}
        disabled={take.isPending}
        sx={{ minHeight: 72, fontSize: '1.35rem', alignSelf: { xs: 'stretch', sm: 'flex-start' } }}
      >
        {take.isPending ? 'Taking the bands off…' : `Bands off: load ${load.number}`}
      </Button>
      {refusal ? (
        <Alert severity="warning" role="alert" data-testid="bands-refusal" sx={{ fontSize: '1.15rem' }}>
          {refusal}
        </Alert>
      ) : null}
      {refusal && role === 'lead' ? (
        <Button variant="outlined" color="warning" onClick={() => setOverriding(true)} sx={{ alignSelf: 'flex-start' }}>
          Take them off early (lead)
        </Button>
      ) : null}
      {refusal && role === 'helper' ? (
        <Typography sx={{ color: 'text.secondary' }}>
          Only a lead can take the bands off earlier, with a reason.
        </Typography>
      ) : null}
      {overriding ? (
        <BandsOverrideDialog
          kitchenId={kitchenId}
          load={load}
          refusal={refusal}
          onClose={() => setOverriding(false)}
          onDone={() => {
            setOverriding(false);
            setRefusal(null);
          }}
        />
      ) : null}
    </Stack>
  );
}
