import type { AttachmentView } from '@jarday/contracts';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import PictureAsPdf from '@mui/icons-material/PictureAsPdfOutlined';
import Box from '@mui/material/Box';
import ButtonBase from '@mui/material/ButtonBase';
import CircularProgress from '@mui/material/CircularProgress';
import IconButton from '@mui/material/IconButton';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useBlobUrl } from '../hooks/use-blob-url';

function Thumb({ kitchenId, attachment }: { kitchenId: string; attachment: AttachmentView }) {
  const blob = useBlobUrl(kitchenId, attachment.hasThumb ? attachment.id : null, 'thumb');
  if (!attachment.hasThumb) return <PictureAsPdf sx={{ fontSize: 72, color: 'primary.main' }} aria-hidden />;
  if (blob.status === 'loading') return <CircularProgress size={32} aria-label={`Loading ${attachment.fileName}`} />;
  if (blob.status === 'error') return <Typography variant="body2">{blob.message}</Typography>;
  return (
    <Box
      component="img"
      src={blob.url}
      alt={attachment.fileName}
      sx={{ width: '100%', height: '100%', objectFit: 'cover', display: 'block' }}
    />
  );
}

export interface AttachmentTileProps {
  kitchenId: string;
  attachment: AttachmentView;
  canRemove: boolean;
  onOpen: (attachment: AttachmentView) => void;
  onRemove: (attachment: AttachmentView) => void;
}

/** One photo or document: its thumbnail (or a document mark), its name, who added it. */
export function AttachmentTile({ kitchenId, attachment, canRemove, onOpen, onRemove }: AttachmentTileProps) {
  const kind = attachment.mime === 'application/pdf' ? 'document' : 'photo';
  return (
    <Paper variant="outlined" component="li" sx={{ overflow: 'hidden', listStyle: 'none', minWidth: 0 }}>
      <ButtonBase
        onClick={() => onOpen(attachment)}
        aria-label={`Open ${kind} ${attachment.fileName}`}
        sx={{ width: '100%', aspectRatio: '1', bgcolor: 'action.hover', display: 'flex' }}
      >
        <Thumb kitchenId={kitchenId} attachment={attachment} />
      </ButtonBase>
      <Stack direction="row" sx={{ alignItems: 'center', pl: 1.5, pr: 0.5, py: 0.5, minHeight: 56 }}>
        <Box sx={{ flex: 1, minWidth: 0 }}>
          <Typography variant="body2" noWrap title={attachment.fileName}>
            {attachment.fileName}
          </Typography>
          {attachment.uploadedByName ? (
            <Typography variant="caption" color="text.secondary" noWrap component="div">
              {attachment.uploadedByName}
            </Typography>
          ) : null}
        </Box>
        {canRemove ? (
          <IconButton aria-label={`Remove ${attachment.fileName}`} onClick={() => onRemove(attachment)} size="large">
            <DeleteOutlined />
          </IconButton>
        ) : null}
      </Stack>
    </Paper>
  );
}
