import type { ReminderKind } from '@jarday/contracts';
import { bandRemovalTimes, reprocessDeadline } from '@jarday/rules';

const HOUR_MS = 3_600_000;

/**
 * The reprocess reminder goes out 2 hours before the 24-hour window closes (USDA Complete Guide to Home Canning,
 * Guide 1: an unsealed jar may be reprocessed within 24 hours). Two hours leave time to read the mail, get home,
 * fit new lids, heat the canner and bring it back up; a later warning would come when it can no longer be acted on.
 */
export const REPROCESS_WARNING_MS = 2 * HOUR_MS;

/** The longest the rules look back: past 24 h after lifting, neither reminder can still help. */
export const LOOKBACK_MS = 24 * HOUR_MS;

/** What the rules need to know about a lifted load. */
export interface LoadFacts {
  liftedAt: Date;
  bandsOffAt: Date | null;
  toReprocess: number;
  reprocessed: boolean;
  claimed: readonly ReminderKind[];
}

export interface DueReminder {
  kind: ReminderKind;
  dueAt: Date;
  /** The reminder is pointless from this moment on, and is not sent any more. */
  staleAt: Date;
}

/**
 * The reminders a load still owes, derived from its data rather than from the moments that changed it, so they
 * survive a restart and follow later changes (bands taken off, a reprocessing load made) without hooks.
 * - bands-ready: 12 h after lifting while the bands are on, until 24 h (the recommended time, when the board
 *   says it anyway).
 * - reprocess-deadline: 22 h after lifting when jars were marked "reprocess" and no load carries them yet, until
 *   the window closes at 24 h.
 */
export function remindersOwed(load: LoadFacts): DueReminder[] {
  const owed: DueReminder[] = [];
  if (load.bandsOffAt === null && !load.claimed.includes('bands-ready')) {
    const { earliestAt, recommendedAt } = bandRemovalTimes(load.liftedAt);
    owed.push({ kind: 'bands-ready', dueAt: earliestAt, staleAt: recommendedAt });
  }
  if (load.toReprocess > 0 && !load.reprocessed && !load.claimed.includes('reprocess-deadline')) {
    const deadline = reprocessDeadline(load.liftedAt);
    owed.push({
      kind: 'reprocess-deadline',
      dueAt: new Date(deadline.getTime() - REPROCESS_WARNING_MS),
      staleAt: deadline,
    });
  }
  return owed;
}
