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

  /** Runs `act` in one transaction with its ledger row; the caller publishes the events after the commit. */
  once<T>(
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
