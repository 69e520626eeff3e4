import { useCallback } from 'react';
import { getLiveSocket, requestLive } from '../../../lib/socket';
import { useLiveStore } from '../stores/live-store';
import type { BoardAction } from '../utils/timer-actions';

/**
 * Sends a board action to the server: first the alarms it answers, then the command or the new timer. Each message
 * carries a fresh command id, so socket.io's one retry never acts twice. Resolves to an error sentence, or null.
 */
export function useRunAction(dayId: string): (action: BoardAction) => Promise<string | null> {
  return useCallback(
    async (action) => {
      const socket = getLiveSocket();
      const put = useLiveStore.getState().putTimer;
      for (const timerId of action.acknowledge) {
        const acked = await requestLive(socket, 'alarm:ack', { commandId: crypto.randomUUID(), dayId, timerId });
        if ('data' in acked) put(acked.data.timer);
      }
      const answer =
        action.kind === 'command'
          ? await requestLive(socket, 'timer:command', {
              commandId: crypto.randomUUID(),
              dayId,
              timerId: action.timerId,
              command: action.command,
            })
          : await requestLive(socket, 'timer:start', { commandId: crypto.randomUUID(), dayId, timer: action.timer });
      if ('error' in answer) return answer.error.message;
      put(answer.data.timer);
      return null;
    },
    [dayId],
  );
}
