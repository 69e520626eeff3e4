import type { JournalEvent } from '@jarday/contracts';
import { Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { type AppConfig, InjectConfig } from '../config/app-config.js';
import { linkBase } from '../mail/links.js';
import { daySummaryMail } from '../mail/mail-templates.js';
import { MailService } from '../mail/mail.service.js';
import { LivePublisher } from '../realtime/live-publisher.js';
import { RemindersRepository } from './reminders.repository.js';

/**
 * When a day is closed, each member of its kitchen gets a short record of it: loads, jars, and the seal rate when
 * seals were checked. Every member, watchers too, and whatever their reminder choice: it is a record, not a nudge.
 */
@Injectable()
export class DaySummaryMailer implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('DaySummaryMail');
  private unsubscribe: (() => void) | undefined;
  private stopped = false;

  constructor(
    private readonly repo: RemindersRepository,
    private readonly mail: MailService,
    private readonly publisher: LivePublisher,
    @InjectConfig() private readonly config: AppConfig,
  ) {}

  onApplicationBootstrap(): void {
    if (!this.mail.enabled) return;
    this.unsubscribe = this.publisher.subscribe((events) => {
      for (const e of events) if (e.type === 'day.closed') setImmediate(() => this.send(e));
    });
  }

  onApplicationShutdown(): void {
    this.stopped = true;
    this.unsubscribe?.();
  }

  private send(closed: JournalEvent): void {
    if (this.stopped) return;
    try {
      this.sendNow(closed);
    } catch (error) {
      this.logger.error(`Day summary of ${closed.dayId}: ${error instanceof Error ? error.message : String(error)}`);
    }
  }

  private sendNow(closed: JournalEvent): void {
    const day = this.repo.daySummary(closed.dayId);
    if (!day) return;
    const link = `${linkBase(this.config, undefined)}/kitchens/${day.kitchenId}/days/${closed.dayId}`;
    for (const member of this.repo.dayMembers(closed.dayId)) {
      this.mail.sendLater(
        daySummaryMail({
          to: member.email,
          kitchenName: day.kitchenName,
          dayDate: day.date,
          dayTitle: day.title,
          loads: day.loads,
          seals: day.seals,
          link,
        }),
      );
    }
  }
}
