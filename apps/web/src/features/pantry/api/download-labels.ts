import type { LabelSheet } from '@jarday/contracts';
import { useMutation } from '@tanstack/react-query';
import { apiBlob } from '../../../lib/api-client';
import { lotPath } from './pantry-keys';

/** GET /api/kitchens/:kitchenId/lots/:lotId/labels.pdf?sheet= (any member): a label per sealed jar, to print. */
export function getLabelsPdf(kitchenId: string, lotId: string, sheet: LabelSheet): Promise<Blob> {
  return apiBlob(`${lotPath(kitchenId, lotId)}/labels.pdf?sheet=${encodeURIComponent(sheet)}`);
}

/** Hands the PDF to the browser as a download named after the lot. */
function saveFile(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // The browser has taken its copy once the click is handled; the next turn frees the memory.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

export function useDownloadLabels(kitchenId: string, lotId: string, lotCode: string) {
  return useMutation({
    mutationFn: (sheet: LabelSheet) => getLabelsPdf(kitchenId, lotId, sheet),
    onSuccess: (blob, sheet) => saveFile(blob, `jarday-labels-${lotCode}-${sheet}.pdf`),
  });
}
