import type { Ack, JournalEvent, LiveError } from '@jarday/contracts';
import { commandFingerprint, decideCommand } from '@jarday/live';
import { Injectable } from '@nestjs/common';
import { eq, sql } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { commandLedger } from '../db/schema/index.js';

export type CommandOutcome<T> = { data: T; events: JournalEvent[] } | { error: LiveError };

interface Stored<T> {
  fingerprint: string;
  answer: Ack<T>;
}

interface Queued {
  run: () => { answer: Ack<unknown>; events: JournalEvent[] };
  resolve: (value: { answer: Ack<unknown>; events: JournalEvent[] }) => void;
  reject: (error: unknown) => void;
}

/**
 * Makes a device's command act once per command id: a retry or a doubled tap gets the first answer again; the same
 * id for a different command is refused. The ledger row is written in the command's own transaction.
 */
@Injectable()
export class CommandLedger {
  private readonly find;
  private readonly insert;

  constructor(@InjectDb() private readonly db: Db) {
    this.find = db
      .select()
      .from(commandLedger)
      .where(eq(commandLedger.commandId, sql.placeholder('id')))
      .prepare();
    this.insert = db
      .insert(commandLedger)
      .values({
        commandId: sql.placeholder('commandId'),
        dayId: sql.placeholder('dayId'),
        userId: sql.placeholder('userId'),
        answer: sql.placeholder('answer'),
        at: sql.placeholder('at'),
      })
      .prepare();
  }

  private queue: Queued[] = [];

  /**
   * Runs `act` with its ledger row, and answers once that is committed; the caller publishes the events then.
   * Commands that arrive in the same turn of the event loop share one commit (group commit): each runs in its own
   * savepoint, so one failing rolls back only itself, and their journal numbers follow their arrival.
   */
  once<T>(
    event: string,
    dayId: string,
    commandId: string,
    userId: string,
    payload: object,
    act: () => CommandOutcome<T>,
  ): Promise<{ answer: Ack<T>; events: JournalEvent[] }> {
    return new Promise((resolve, reject) => {
      if (this.queue.length === 0) setImmediate(() => this.flush());
      this.queue.push({
        run: () => this.onceNow(event, dayId, commandId, userId, payload, act),
        resolve: resolve as Queued['resolve'],
        reject,
      });
    });
  }

  private flush(): void {
    const batch = this.queue;
    this.queue = [];
    const results: ({ ok: true; value: ReturnType<Queued['run']> } | { ok: false; error: unknown })[] = [];
    try {
      this.db.$client.transaction(() => {
        for (const item of batch) {
          try {
            results.push({ ok: true, value: item.run() });
          } catch (error) {
            results.push({ ok: false, error });
          }
        }
      })();
    } catch (error) {
      for (const item of batch) item.reject(error);
      return;
    }
    batch.forEach((item, i) => {
      const r = results[i]!;
      if (r.ok) item.resolve(r.value);
      else item.reject(r.error);
    });
  }

  /** One command in its own (nested: a savepoint inside a group commit) transaction. */
  onceNow<T>(
    event: string,
    dayId: string,
    commandId: string,
    userId: string,
    payload: object,
    act: () => CommandOutcome<T>,
  ): { answer: Ack<T>; events: JournalEvent[] } {
    const fingerprint = commandFingerprint({ event, dayId, actorId: userId, payload });
    return this.db.transaction(() => {
      const row = this.find.get({ id: commandId });
      const stored = row?.answer as Stored<T> | undefined;
      const previous =
        row && stored ? { commandId, fingerprint: stored.fingerprint, answer: stored.answer } : undefined;
      const decision = decideCommand(previous, commandId, fingerprint);
      if (decision.action === 'replay') return { answer: decision.answer, events: [] };
      if (decision.action === 'refuse') return { answer: { error: decision.error }, events: [] };
      const outcome = act();
      const answer: Ack<T> = 'error' in outcome ? { error: outcome.error } : { data: outcome.data };
      const record: Stored<T> = { fingerprint, answer };
      this.insert.run({ commandId, dayId, userId, answer: record, at: Date.now() });
      return { answer, events: 'error' in outcome ? [] : outcome.events };
    });
  }
}
