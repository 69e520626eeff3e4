import type { Role } from '@jarday/contracts';

/** How roles read in the interface. */
export const ROLE_LABELS: Record<Role, string> = { lead: 'Lead', helper: 'Helper', watcher: 'Watcher' };

export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  lead: 'Plans the day, edits recipes, invites people and changes kitchen settings.',
  helper: 'Runs timers, confirms the boil, records jars and seal checks.',
  watcher: 'Follows the board and the journal; cannot give commands.',
};

/** A date and time in the reader's own locale, e.g. for when an invite runs out. */
export function formatDateTime(iso: string): string {
  return new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}

export function formatDate(iso: string): string {
  return new Date(iso).toLocaleDateString(undefined, { dateStyle: 'medium' });
}
