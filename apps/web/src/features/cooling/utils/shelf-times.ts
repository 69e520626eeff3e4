import type { CoolingLoadView } from '@jarday/contracts';
import { formatRemaining } from '@jarday/rules';

/** Where a load stands on the shelf at one moment (server time). */
export type BandStage = 'resting' | 'may-come-off' | 'recommended' | 'off';

export function bandStage(load: CoolingLoadView, serverNow: number): BandStage {
  if (load.bandsOffAt) return 'off';
  if (serverNow < Date.parse(load.bandsEarliestAt)) return 'resting';
  return serverNow < Date.parse(load.bandsRecommendedAt) ? 'may-come-off' : 'recommended';
}

/** "in 3 h 5 min" before the moment, "now" at or after it. */
export function untilText(at: string, serverNow: number): string {
  const left = Date.parse(at) - serverNow;
  return left > 0 ? `in ${formatRemaining(left)}` : 'now';
}

/** "13 h 20 min" since the moment, counted in whole minutes (rounded down, unlike a wait). */
export function sinceText(at: string, serverNow: number): string {
  const minutes = Math.max(0, Math.floor((serverNow - Date.parse(at)) / 60_000));
  return formatRemaining(minutes * 60_000);
}

/** A clock time in the reader's locale, with the weekday when it is not today. */
export function clockAt(iso: string, deviceNow = Date.now()): string {
  const at = new Date(iso);
  const sameDay = at.toDateString() === new Date(deviceNow).toDateString();
  const time: Intl.DateTimeFormatOptions = { hour: 'numeric', minute: '2-digit' };
  return at.toLocaleString(undefined, sameDay ? time : { ...time, weekday: 'short' });
}

/** Jars of the load still waiting to be reprocessed: marked "reprocess" and not yet carried by a new load. */
export function jarsToReprocess(load: CoolingLoadView): number {
  if (load.reprocessedBy) return 0;
  return load.sealChecks.filter((c) => c.outcome === 'reprocess').length;
}
