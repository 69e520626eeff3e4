import {
  type BeforeApplicationShutdown,
  Injectable,
  Logger,
  type OnApplicationShutdown,
  type OnModuleInit,
} from '@nestjs/common';
import { createTransport, type Transporter } from 'nodemailer';
import { type AppConfig, InjectConfig } from '../config/app-config.js';
import { MailCatcher } from './mail-catcher.js';

/** One message: a plain-text body always, and a simple HTML one beside it. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export type SendResult = { ok: true } | { ok: false; error: string };

/** How long shutting down waits for mail already handed to the transport. */
const DRAIN_MS = 5_000;

/**
 * Outgoing mail. With SMTP_URL set it sends there; in development and demo mode without it, to an in-process
 * catcher on loopback (read at GET /api/dev/mail); otherwise (tests, a server without mail) it sends nothing.
 * A send never throws: mail is a courtesy next to the change that caused it, so a failure is logged and reported
 * to the caller, and the request that caused it still succeeds.
 */
@Injectable()
export class MailService implements OnModuleInit, BeforeApplicationShutdown, OnApplicationShutdown {
  private readonly logger = new Logger('Mail');
  private transport: Transporter | undefined;
  private devCatcher: MailCatcher | undefined;
  private readonly inflight = new Set<Promise<SendResult>>();

  constructor(@InjectConfig() private readonly config: AppConfig) {}

  async onModuleInit(): Promise<void> {
    if (this.config.SMTP_URL) {
      this.transport = createTransport(this.config.SMTP_URL);
    } else if (this.config.mailCatcher) {
      this.devCatcher = await MailCatcher.start(this.config.MAIL_CATCHER_PORT);
      this.transport = createTransport(this.devCatcher.url);
      this.logger.log(
        `No SMTP_URL: mail goes to the loopback catcher at ${this.devCatcher.url}, read at /api/dev/mail`,
      );
    }
    if (this.transport && this.config.NODE_ENV === 'production' && !this.config.PUBLIC_URL) {
      this.logger.warn('PUBLIC_URL is not set: links in e-mails take the address from each request');
    }
  }

  /** False when this server sends no mail at all. */
  get enabled(): boolean {
    return this.transport !== undefined;
  }

  /** The in-process catcher of development and demo mode, if this server runs one. */
  get catcher(): MailCatcher | undefined {
    return this.devCatcher;
  }

  /** Sends and tells how it went; never throws. */
  send(message: MailMessage): Promise<SendResult> {
    const transport = this.transport;
    if (!transport) return Promise.resolve({ ok: false, error: 'This server sends no mail (no SMTP_URL)' });
    const sending = transport
      .sendMail({ from: this.config.MAIL_FROM, ...message })
      .then((): SendResult => ({ ok: true }))
      .catch((error: unknown): SendResult => {
        const text = error instanceof Error ? error.message : String(error);
        this.logger.error(`Could not send "${message.subject}" to ${message.to}: ${text}`);
        return { ok: false, error: text.slice(0, 500) };
      });
    this.inflight.add(sending);
    void sending.finally(() => this.inflight.delete(sending));
    return sending;
  }

  /** Sends without making the caller wait: for mail that follows a request's answer. */
  sendLater(message: MailMessage): void {
    void this.send(message);
  }

  async beforeApplicationShutdown(): Promise<void> {
    if (this.inflight.size === 0) return;
    let timer: NodeJS.Timeout | undefined;
    await Promise.race([
      Promise.allSettled([...this.inflight]),
      new Promise((resolve) => (timer = setTimeout(resolve, DRAIN_MS))),
    ]);
    clearTimeout(timer);
  }

  async onApplicationShutdown(): Promise<void> {
    this.transport?.close();
    await this.devCatcher?.close();
  }
}
