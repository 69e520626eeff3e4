import { HOUR_MS, MINUTE_MS, SECOND_MS } from './constants.js';

/**
 * A duration for people: "45 min", "1 h 30 min", "12 h", "30 s", "1 min 30 s". Whole seconds, rounded up, so a time
 * still to wait never reads as zero.
 */
export function formatDuration(ms: number): string {
  const total = Math.ceil(Math.max(0, ms) / SECOND_MS);
  const h = Math.floor(total / (HOUR_MS / SECOND_MS));
  const m = Math.floor((total % (HOUR_MS / SECOND_MS)) / (MINUTE_MS / SECOND_MS));
  const s = total % (MINUTE_MS / SECOND_MS);
  const parts = [h > 0 ? `${h} h` : '', m > 0 ? `${m} min` : '', s > 0 ? `${s} s` : ''].filter(Boolean);
  return parts.length > 0 ? parts.join(' ') : '0 s';
}
