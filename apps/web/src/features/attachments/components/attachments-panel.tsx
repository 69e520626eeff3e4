import type { AttachmentSubject, AttachmentView, Role } from '@jarday/contracts';
import AddPhotoAlternate from '@mui/icons-material/AddPhotoAlternateOutlined';
import PhotoCamera from '@mui/icons-material/PhotoCameraOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import useMediaQuery from '@mui/material/useMediaQuery';
import { type ChangeEvent, useState } from 'react';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Loading, QueryError } from '../../../components/ui/query-state';
import { useSessionStore } from '../../auth/stores/session-store';
import { useDeleteAttachment } from '../api/delete-attachment';
import { useAttachments } from '../api/get-attachments';
import { useUploadAttachment } from '../api/upload-attachment';
import { AttachmentTile } from './attachment-tile';
import { AttachmentViewer } from './attachment-viewer';

export interface AttachmentsPanelProps {
  kitchenId: string;
  /** The viewer's role in the kitchen: watchers look, helpers and leads add. */
  role: Role;
  subject: AttachmentSubject;
  subjectId: string;
  title?: string;
}

const bigButton = { minHeight: 64, px: 3, fontSize: '1.125rem' } as const;

/** Photos of finished jars and scanned recipe cards of a day, load, lot or recipe. */
export function AttachmentsPanel({
  kitchenId,
  role,
  subject,
  subjectId,
  title = 'Photos and documents',
}: AttachmentsPanelProps) {
  const list = useAttachments(kitchenId, subject, subjectId);
  const upload = useUploadAttachment(kitchenId, subject, subjectId);
  const remove = useDeleteAttachment(kitchenId, subject, subjectId);
  const userId = useSessionStore((s) => s.user?.id ?? null);
  // A phone or tablet can go straight to its camera; on a computer the file chooser does everything.
  const touch = useMediaQuery('(pointer: coarse)');
  const [open, setOpen] = useState<AttachmentView | null>(null);
  const [removing, setRemoving] = useState<AttachmentView | null>(null);
  const [sending, setSending] = useState<string | null>(null);
  const canAdd = role === 'lead' || role === 'helper';

  const onFile = (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    setSending(file.name);
    upload.mutate(file, { onSettled: () => setSending(null) });
  };
  const picker = (label: string, icon: React.ReactNode, accept: string, capture?: 'environment') => (
    <Button
      component="label"
      variant="contained"
      size="large"
      startIcon={icon}
      sx={bigButton}
      disabled={sending !== null}
    >
      {label}
      <input hidden type="file" accept={accept} capture={capture} onChange={onFile} />
    </Button>
  );

  return (
    <Paper variant="outlined" component="section" aria-label={title} sx={{ p: { xs: 2, sm: 3 }, mt: 3 }}>
      <Stack spacing={2}>
        <Typography variant="h3" component="h2">
          {title}
        </Typography>
        {canAdd ? (
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
            {touch ? picker('Take photo', <PhotoCamera />, 'image/*', 'environment') : null}
            {picker(
              touch ? 'Add photo or PDF' : 'Add photo',
              <AddPhotoAlternate />,
              'image/jpeg,image/png,image/webp,application/pdf',
            )}
          </Stack>
        ) : null}
        {sending ? (
          <Stack spacing={0.5} role="status">
            <Typography variant="body2">Adding {sending}…</Typography>
            <LinearProgress />
          </Stack>
        ) : null}
        {upload.isError ? (
          <Alert severity="error" onClose={() => upload.reset()}>
            <strong>Not added. </strong>
            {upload.error.message}
          </Alert>
        ) : null}
        {list.isPending ? <Loading label="Loading photos and documents" /> : null}
        {list.isError ? <QueryError error={list.error} onRetry={() => void list.refetch()} /> : null}
        {list.data?.length === 0 ? (
          <Typography color="text.secondary">
            {canAdd ? 'No photos or documents yet. JPEG, PNG, WebP or PDF.' : 'No photos or documents yet.'}
          </Typography>
        ) : null}
        {list.data && list.data.length > 0 ? (
          <Box
            component="ul"
            sx={{ display: 'grid', gridTemplateColumns: 'repeat(auto-fill, minmax(140px, 1fr))', gap: 1.5, m: 0, p: 0 }}
          >
            {list.data.map((a) => (
              <AttachmentTile
                key={a.id}
                kitchenId={kitchenId}
                attachment={a}
                canRemove={role === 'lead' || (canAdd && a.uploadedById !== null && a.uploadedById === userId)}
                onOpen={setOpen}
                onRemove={(target) => {
                  remove.reset();
                  setRemoving(target);
                }}
              />
            ))}
          </Box>
        ) : null}
      </Stack>
      <AttachmentViewer kitchenId={kitchenId} attachment={open} onClose={() => setOpen(null)} />
      <ConfirmDialog
        open={removing !== null}
        title={`Remove ${removing?.fileName ?? ''}?`}
        confirmLabel="Remove"
        pending={remove.isPending}
        error={remove.isError ? remove.error.message : null}
        onClose={() => setRemoving(null)}
        onConfirm={() => removing && remove.mutate(removing.id, { onSuccess: () => setRemoving(null) })}
      >
        The file is deleted for everyone in the kitchen. This cannot be undone.
      </ConfirmDialog>
    </Paper>
  );
}
