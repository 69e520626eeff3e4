import { Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { type AppConfig, InjectConfig } from '../config/app-config.js';
import { linkBase } from '../mail/links.js';
import { reminderMail } from '../mail/mail-templates.js';
import { MailService } from '../mail/mail.service.js';
import { type JournalListener, LivePublisher } from '../realtime/live-publisher.js';
import { type DueReminder, LOOKBACK_MS, remindersOwed } from './reminder-rules.js';
import { type ReminderLoad, RemindersRepository } from './reminders.repository.js';

/** Journal entries that can change what a load is owed: lifting, bands, seal checks, a reprocessing load. */
const RELEVANT = /^(load|seal|seals|bands|cooling|reprocess)\./;
const MAX_TIMEOUT_MS = 2 ** 31 - 1;

/**
 * Sends each reminder once. The owed reminders are derived from the data (reminder-rules.ts); one timeout wakes
 * the scheduler at the next due time, never later than REMINDER_CHECK_SECONDS, and a relevant journal entry makes
 * it look again at once. It re-arms at start-up, so a restart only delays what came due while it was down.
 *
 * Once means at most once: the `reminders` row (unique per load and kind) is inserted before the mail goes out,
 * and a row claimed but never settled, which a crash between the claim and the send leaves, is not sent again.
 * A lost reminder costs little (the cooling shelf shows the same times on the board); a reminder repeated at
 * every restart of a crashing server would teach people to ignore them.
 */
@Injectable()
export class RemindersService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('Reminders');
  private timer: NodeJS.Timeout | undefined;
  private unsubscribe: (() => void) | undefined;
  private recheckQueued = false;
  private stopped = false;
  private readonly sending = new Set<Promise<void>>();

  constructor(
    private readonly repo: RemindersRepository,
    private readonly mail: MailService,
    private readonly publisher: LivePublisher,
    @InjectConfig() private readonly config: AppConfig,
  ) {}

  onApplicationBootstrap(): void {
    // A server that sends no mail claims nothing: the reminders stay owed, not silently spent.
    if (!this.mail.enabled) return;
    const listener: JournalListener = (events) => {
      // On the live path: only look at the types and queue the work for later in this turn of the loop.
      if (this.recheckQueued || !events.some((e) => RELEVANT.test(e.type))) return;
      this.recheckQueued = true;
      setImmediate(() => {
        this.recheckQueued = false;
        this.check();
      });
    };
    this.unsubscribe = this.publisher.subscribe(listener);
    const unsettled = this.repo.countUnsettled();
    if (unsettled > 0) {
      this.logger.warn(`${unsettled} reminder(s) were claimed but not sent before a stop; they are not sent again`);
    }
    this.check();
  }

  /** Sends what is due at `now` and arms the timeout for the next one. */
  check(now = new Date()): void {
    if (this.stopped) return;
    let next = now.getTime() + this.config.REMINDER_CHECK_SECONDS * 1000;
    for (const load of this.repo.liftedSince(new Date(now.getTime() - LOOKBACK_MS))) {
      for (const owed of remindersOwed(load)) {
        const due = owed.dueAt.getTime();
        if (due > now.getTime()) next = Math.min(next, due);
        else if (now < owed.staleAt) this.track(this.deliver(load, owed, now));
      }
    }
    this.arm(next);
  }

  /** Resolves when the reminders being sent now are settled (for a clean shutdown). */
  async idle(): Promise<void> {
    await Promise.allSettled([...this.sending]);
  }

  async onApplicationShutdown(): Promise<void> {
    this.stopped = true;
    clearTimeout(this.timer);
    this.unsubscribe?.();
    await this.idle();
  }

  private arm(at: number): void {
    clearTimeout(this.timer);
    const wait = Math.min(Math.max(0, at - Date.now()), MAX_TIMEOUT_MS);
    this.timer = setTimeout(() => this.check(), wait);
    this.timer.unref();
  }

  private track(p: Promise<void>): void {
    this.sending.add(p);
    void p.finally(() => this.sending.delete(p));
  }

  private async deliver(load: ReminderLoad, owed: DueReminder, now: Date): Promise<void> {
    const claim = this.repo.transaction(() => {
      const id = this.repo.claim({
        kitchenId: load.kitchenId,
        loadId: load.loadId,
        kind: owed.kind,
        dueAt: owed.dueAt,
        claimedAt: now,
      });
      return id ? { id, recipients: this.repo.recipients(load.kitchenId) } : null;
    });
    if (!claim) return;
    if (claim.recipients.length === 0) {
      this.repo.settle(claim.id, { sentAt: null, recipients: 0, note: 'Nobody in the kitchen keeps reminders on' });
      return;
    }
    const link = `${linkBase(this.config, undefined)}/kitchens/${load.kitchenId}/cooling?day=${load.dayId}`;
    const results = await Promise.all(
      claim.recipients.map((r) =>
        this.mail.send(
          reminderMail({
            to: r.email,
            kind: owed.kind,
            kitchenName: load.kitchenName,
            loadNumber: load.number,
            recipeName: load.recipeName,
            dayDate: load.dayDate,
            liftedAt: load.liftedAt,
            deadline: owed.staleAt,
            link,
          }),
        ),
      ),
    );
    const sent = results.filter((r) => r.ok).length;
    const errors = results.flatMap((r) => (r.ok ? [] : [r.error]));
    this.repo.settle(claim.id, {
      sentAt: sent > 0 ? new Date() : null,
      recipients: sent,
      note: errors.length > 0 ? `${errors.length} not sent: ${errors[0]}`.slice(0, 500) : null,
    });
    this.logger.log(`Reminder ${owed.kind} for load ${load.number} of ${load.kitchenName}: sent to ${sent}`);
  }
}
