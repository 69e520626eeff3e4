import type { CommandContext, LeadOverride } from './commands.js';
import { formatDuration } from './format.js';
import { refuse, type Refusal } from './internal.js';
import type { TimerKind, TimerOverride } from './timer.js';

function belowMinimumMessage(kind: TimerKind, minimumMs: number): string {
  const needs = 'a shorter time needs a lead’s override with a reason.';
  if (kind === 'canner-rest') {
    return `Jars rest ${formatDuration(minimumMs)} in the canner, heat off and lid off, before they come out; ${needs}`;
  }
  if (kind === 'cooling-rest') {
    return `Jars cool undisturbed at least ${formatDuration(minimumMs)} before the bands come off; ${needs}`;
  }
  return `The tested process time for this load is ${formatDuration(minimumMs)}; ${needs}`;
}

/**
 * The safety gate on every duration: at or above the minimum it passes untouched (an override sent along is not
 * needed and not recorded). Below it, only a lead with a non-empty reason may go on, and the override is returned
 * so the timer keeps it for the journal.
 */
export function checkMinimum(
  kind: TimerKind,
  durationMs: number,
  minimumMs: number | null,
  override: LeadOverride | undefined,
  ctx: CommandContext,
): { ok: true; override: TimerOverride | null } | Refusal {
  if (minimumMs === null || durationMs >= minimumMs) return { ok: true, override: null };
  if (!override) return refuse('below_minimum', belowMinimumMessage(kind, minimumMs));
  if (ctx.actorRole !== 'lead') return refuse('forbidden', 'Only a lead can override a tested or safe minimum time.');
  const reason = typeof override.reason === 'string' ? override.reason.trim() : '';
  if (reason.length === 0) {
    return refuse('override_reason_required', 'An override needs a reason, so the journal shows why.');
  }
  return { ok: true, override: { byUserId: ctx.actorId, reason, at: ctx.now, durationMs, minimumMs } };
}
