import Add from '@mui/icons-material/Add';
import type { CannerView } from '@jarday/contracts';
import Button from '@mui/material/Button';
import Divider from '@mui/material/Divider';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Fragment, useState } from 'react';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Loading, QueryError } from '../../../components/ui/query-state';
import { useCanners } from '../api/get-canners';
import { useDeleteCanner } from '../api/delete-canner';
import { formatCapacity, GAUGE_LABELS, METHOD_LABELS } from '../utils/canner-labels';
import { CannerDialog } from './canner-dialog';
import { DialGaugeCaution } from './dial-gauge-caution';

type Editing = { mode: 'closed' } | { mode: 'add' } | { mode: 'edit'; canner: CannerView };

/** The kitchen's canners; a lead can add, edit and delete them. */
export function CannerList({ kitchenId, canManage }: { kitchenId: string; canManage: boolean }) {
  const canners = useCanners(kitchenId);
  const [editing, setEditing] = useState<Editing>({ mode: 'closed' });
  const [deleting, setDeleting] = useState<CannerView | null>(null);
  const remove = useDeleteCanner(kitchenId, { onSuccess: () => setDeleting(null) });

  if (canners.isPending) return <Loading label="Loading canners" />;
  if (canners.isError) return <QueryError error={canners.error} onRetry={() => void canners.refetch()} />;
  const hasDial = canners.data.some((c) => c.method === 'pressure' && c.gauge === 'dial');

  return (
    <Stack spacing={2}>
      {canners.data.length === 0 ? (
        <Typography sx={{ color: 'text.secondary' }}>No canners yet.</Typography>
      ) : (
        <Stack component="ul" sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Canners">
          {canners.data.map((canner, index) => (
            <Fragment key={canner.id}>
              {index > 0 ? <Divider component="li" aria-hidden /> : null}
              <Stack component="li" direction={{ xs: 'column', sm: 'row' }} sx={{ gap: 2, py: 2 }}>
                <Stack sx={{ flex: 1 }}>
                  <Typography variant="h3" component="h3">
                    {canner.name}
                  </Typography>
                  <Typography sx={{ color: 'text.secondary' }}>
                    {METHOD_LABELS[canner.method]}
                    {canner.gauge ? ` · ${GAUGE_LABELS[canner.gauge].toLowerCase()}` : ''}
                  </Typography>
                  <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                    Per load: {formatCapacity(canner.capacity)}
                  </Typography>
                  {canner.waterLitres !== null && canner.burnerWatts !== null ? (
                    <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                      Heating: {canner.waterLitres.toLocaleString()} L on a {canner.burnerWatts.toLocaleString()} W
                      burner
                    </Typography>
                  ) : null}
                </Stack>
                {canManage ? (
                  <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
                    <Button
                      variant="outlined"
                      onClick={() => setEditing({ mode: 'edit', canner })}
                      aria-label={`Edit ${canner.name}`}
                    >
                      Edit
                    </Button>
                    <Button
                      variant="outlined"
                      color="error"
                      onClick={() => {
                        remove.reset();
                        setDeleting(canner);
                      }}
                      aria-label={`Delete ${canner.name}`}
                    >
                      Delete
                    </Button>
                  </Stack>
                ) : null}
              </Stack>
            </Fragment>
          ))}
        </Stack>
      )}
      {hasDial ? <DialGaugeCaution /> : null}
      {canManage ? (
        <Button
          variant="contained"
          startIcon={<Add />}
          onClick={() => setEditing({ mode: 'add' })}
          sx={{ alignSelf: 'flex-start' }}
        >
          Add a canner
        </Button>
      ) : null}
      <CannerDialog
        kitchenId={kitchenId}
        open={editing.mode !== 'closed'}
        canner={editing.mode === 'edit' ? editing.canner : undefined}
        onClose={() => setEditing({ mode: 'closed' })}
      />
      <ConfirmDialog
        open={deleting !== null}
        title={`Delete ${deleting?.name ?? ''}?`}
        confirmLabel="Delete"
        pending={remove.isPending}
        error={remove.isError ? remove.error.message : null}
        onClose={() => setDeleting(null)}
        onConfirm={() => deleting && remove.mutate(deleting.id)}
      >
        The canner is removed from this kitchen and can no longer be picked for a load.
      </ConfirmDialog>
    </Stack>
  );
}
