import type { LabelSheet } from '@jarday/contracts';
import { useMutation } from '@tanstack/react-query';
import { apiBlob } from '../../../lib/api-client';
import { saveFile } from '../../../lib/save-file';
import { lotPath } from './pantry-keys';

/** GET /api/kitchens/:kitchenId/lots/:lotId/labels.pdf?sheet= (any member): a label per sealed jar, to print. */
export function getLabelsPdf(kitchenId: string, lotId: string, sheet: LabelSheet): Promise<Blob> {
  return apiBlob(`${lotPath(kitchenId, lotId)}/labels.pdf?sheet=${encodeURIComponent(sheet)}`);
}

export function useDownloadLabels(kitchenId: string, lotId: string, lotCode: string) {
  return useMutation({
    mutationFn: (sheet: LabelSheet) => getLabelsPdf(kitchenId, lotId, sheet),
    onSuccess: (blob, sheet) => saveFile(blob, `jarday-labels-${lotCode}-${sheet}.pdf`),
  });
}
