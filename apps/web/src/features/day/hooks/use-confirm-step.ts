import type { StepKey } from '@jarday/contracts';
import { useCallback } from 'react';
import { getLiveSocket, requestLive } from '../../../lib/socket';
import { useLiveStore } from '../stores/live-store';

/** Whose step: a batch's prep or a load's canning. */
export interface StepSubject {
  subject: 'batch' | 'load';
  id: string;
}

export type ConfirmStep = (who: StepSubject, step: StepKey, done: boolean) => Promise<string | null>;

/**
 * Ticks (or unticks) a step with `step:confirm`: the server journals it and every device of the day sees it. The
 * answer's tick goes into the store at once. Resolves to the refusal's sentence, or null.
 */
export function useConfirmStep(dayId: string): ConfirmStep {
  return useCallback(
    async (who, step, done) => {
      const subject = who.subject === 'load' ? { loadId: who.id } : { batchId: who.id };
      const answer = await requestLive(getLiveSocket(), 'step:confirm', {
        commandId: crypto.randomUUID(),
        dayId,
        ...subject,
        step,
        done,
      });
      if ('error' in answer) return answer.error.message;
      useLiveStore.getState().putMark(answer.data.mark);
      return null;
    },
    [dayId],
  );
}
