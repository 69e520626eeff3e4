/**
 * Command ids make a retried or doubled tap act once. The server keeps a ledger (one row per command id, in the
 * same transaction as the change) and asks `decideCommand` what to do with each arriving command.
 */

/** One ledger row: the command id, what the command was, and the answer it got. */
export interface CommandRecord<TAnswer> {
  commandId: string;
  fingerprint: string;
  answer: TAnswer;
}

export type CommandDecision<TAnswer> =
  | { action: 'apply' }
  | { action: 'replay'; answer: TAnswer }
  | { action: 'refuse'; error: { code: 'command_id_reused'; message: string } };

function canonical(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(canonical);
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return Object.fromEntries(entries.map(([k, v]) => [k, canonical(v)]));
  }
  return value;
}

/**
 * A stable text for "what was asked": JSON with object keys sorted and unset fields dropped, so the same command
 * always gives the same fingerprint whatever order its fields came in. Include who sent it and the event name, e.g.
 * `commandFingerprint({ event: 'timer:command', actorId, payload })`, so an id reused by someone else is caught.
 */
export function commandFingerprint(value: unknown): string {
  return JSON.stringify(canonical(value));
}

/**
 * What to do with an arriving command, given the ledger row for its id (if any):
 * - no row: `apply` it (and record its answer);
 * - a row with the same fingerprint: `replay` the recorded answer, acting again on nothing (a retry or a doubled tap);
 * - a row with another fingerprint: `refuse`, since an id means one command only.
 * Refusals are worth recording too: a retried refusal then gets the same refusal back.
 */
export function decideCommand<TAnswer>(
  previous: CommandRecord<TAnswer> | undefined,
  commandId: string,
  fingerprint: string,
): CommandDecision<TAnswer> {
  if (previous === undefined || previous.commandId !== commandId) return { action: 'apply' };
  if (previous.fingerprint === fingerprint) return { action: 'replay', answer: previous.answer };
  return {
    action: 'refuse',
    error: { code: 'command_id_reused', message: 'This command id was already used for a different command.' },
  };
}
