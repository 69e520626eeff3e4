import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/** One message as the catcher received it. */
export interface CaughtMail {
  to: string[];
  from: string;
  subject: string;
  text: string;
  html: string | null;
  /** Every http(s) address in the text body, in order. */
  links: string[];
  /** ISO 8601, when the catcher finished reading it. */
  at: string;
}

const LINK = /https?:\/\/[^\s<>"')]+/g;
/** A demo server can run for days: the oldest messages go first beyond this many. */
const KEEP_AT_MOST = 500;

/**
 * A small SMTP server on loopback that keeps what it receives in memory: the outbox of development, demo mode
 * and the tests. It listens on 127.0.0.1 only and accepts no authentication, so it can never relay mail out.
 */
export class MailCatcher {
  private readonly caught: CaughtMail[] = [];
  private readonly waiters = new Set<() => void>();
  private port = 0;

  private readonly server: SMTPServer;

  private constructor() {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      logger: false,
      size: 5 * 1024 * 1024,
      onData: (stream, session, callback) => {
        simpleParser(stream)
          .then((mail) => {
            this.keep({
              to: session.envelope.rcptTo.map((r) => r.address),
              from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
              subject: mail.subject ?? '',
              text: mail.text ?? '',
              html: typeof mail.html === 'string' ? mail.html : null,
              links: [...(mail.text ?? '').matchAll(LINK)].map((m) => m[0]),
              at: new Date().toISOString(),
            });
            callback();
          })
          .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
      },
    });
  }

  /** Starts a catcher on 127.0.0.1 (`port` 0: the system picks a free one). */
  static async start(port = 0): Promise<MailCatcher> {
    const catcher = new MailCatcher();
    const server = catcher.server;
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, '127.0.0.1', () => {
        server.off('error', reject);
        resolve();
      });
    });
    catcher.port = (server.server.address() as AddressInfo).port;
    return catcher;
  }

  /** The address to give nodemailer (or SMTP_URL). */
  get url(): string {
    return `smtp://127.0.0.1:${this.port}`;
  }

  /** What was caught so far, oldest first (a copy). */
  messages(): CaughtMail[] {
    return [...this.caught];
  }

  /**
   * The first caught message matching `predicate`, waiting for it if needed. The wait ends with a failure after
   * `ms`, so a mail that never comes fails a test with a message instead of hanging it.
   */
  waitFor(predicate: (mail: CaughtMail) => boolean, ms = 10_000): Promise<CaughtMail> {
    return new Promise((resolve, reject) => {
      const check = () => {
        const found = this.caught.find(predicate);
        if (!found) return;
        this.waiters.delete(check);
        clearTimeout(timer);
        resolve(found);
      };
      const timer = setTimeout(() => {
        this.waiters.delete(check);
        const subjects = this.caught.map((m) => `"${m.subject}"`).join(', ') || 'nothing';
        reject(new Error(`No matching mail within ${ms} ms; caught ${subjects}`));
      }, ms);
      this.waiters.add(check);
      check();
    });
  }

  /** Forgets what was caught. */
  clear(): void {
    this.caught.length = 0;
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }

  private keep(mail: CaughtMail): void {
    this.caught.push(mail);
    if (this.caught.length > KEEP_AT_MOST) this.caught.shift();
    for (const check of [...this.waiters]) check();
  }
}
