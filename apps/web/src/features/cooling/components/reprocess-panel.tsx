import type { CannerView, CoolingLoadView, ReprocessAnswer } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { useReprocessLoad } from '../api/reprocess-load';
import { clockAt, jarsToReprocess } from '../utils/shelf-times';

interface ReprocessPanelProps {
  kitchenId: string;
  load: CoolingLoadView;
  canners: readonly CannerView[];
  reprocessOpen: boolean;
  canCommand: boolean;
  /** The Counter board of a day, where the new load is run. */
  boardPath: (dayId: string) => string;
}

/**
 * Jars marked "reprocess" go back into a canner with new lids and the full process time, within 24 hours of lifting
 * (USDA Complete Guide to Home Canning, Guide 1). The server opens the new load; that day's Counter board runs it.
 */
export function ReprocessPanel({
  kitchenId,
  load,
  canners,
  reprocessOpen,
  canCommand,
  boardPath,
}: ReprocessPanelProps) {
  const [cannerId, setCannerId] = useState(
    () => (canners.find((c) => c.method === load.method) ?? canners[0])?.id ?? '',
  );
  const [opened, setOpened] = useState<ReprocessAnswer | null>(null);
  const reprocess = useReprocessLoad(kitchenId, load.loadId);
  const jars = jarsToReprocess(load);

  if (opened) {
    return (
      <Alert severity="success" role="status">
        Load {opened.load.number} is open for {opened.jarNumbers.length === 1 ? 'jar' : 'jars'}{' '}
        {opened.jarNumbers.join(', ')}.{opened.dayReopened ? ' The day was opened again for it.' : ''}{' '}
        <Link component={RouterLink} to={boardPath(opened.load.dayId)}>
          Run it on the Counter board
        </Link>
      </Alert>
    );
  }
  if (load.reprocessedBy) {
    return (
      <Typography sx={{ color: 'text.secondary' }}>The unsealed jars went into a new load to reprocess.</Typography>
    );
  }
  if (jars === 0) return null;
  if (!reprocessOpen) {
    return (
      <Alert severity="warning">
        The 24 hours to reprocess ended at {clockAt(load.reprocessDeadline)}. Refrigerate the {jars} unsealed{' '}
        {jars === 1 ? 'jar' : 'jars'} and eat within a few days.
      </Alert>
    );
  }
  if (!canCommand) return null;

  return (
    <Stack spacing={1.5} component="section" aria-label={`Reprocess jars of load ${load.number}`}>
      <Typography sx={{ fontWeight: 700, fontSize: '1.2rem' }}>
        Reprocess {jars} {jars === 1 ? 'jar' : 'jars'} by {clockAt(load.reprocessDeadline)}
      </Typography>
      <Typography>
        Check each rim for nicks (use another jar if needed), put on a new lid and process again for the full time.
      </Typography>
      <TextField select label="Canner for the new load" value={cannerId} onChange={(e) => setCannerId(e.target.value)}>
        {canners.map((c) => (
          <MenuItem key={c.id} value={c.id}>
            {c.name} ({c.method === 'pressure' ? 'pressure' : 'boiling water'})
          </MenuItem>
        ))}
      </TextField>
      {reprocess.isError ? (
        <Alert severity="error" role="alert">
          {reprocess.error.message}
        </Alert>
      ) : null}
      <Button
        variant="contained"
        color="secondary"
        disabled={reprocess.isPending || !cannerId}
        onClick={() => reprocess.mutate({ cannerId }, { onSuccess: setOpened })}
        sx={{ minHeight: 64, alignSelf: 'flex-start' }}
      >
        {reprocess.isPending ? 'Opening the load…' : `Open a load to reprocess ${jars} ${jars === 1 ? 'jar' : 'jars'}`}
      </Button>
    </Stack>
  );
}
