import { Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';

/** setTimeout takes at most 2^31 - 1 ms (about 24.8 days); longer waits are taken in steps. */
const MAX_TIMEOUT_MS = 2 ** 31 - 1;

/**
 * Exactly one timeout per timer, at its next deadline. The deadline lives in SQLite; this is only the alarm clock
 * that wakes the server for it, and it is rebuilt from the database at start-up.
 */
@Injectable()
export class TimerScheduler implements OnApplicationShutdown {
  private readonly logger = new Logger('TimerScheduler');
  private readonly handles = new Map<string, NodeJS.Timeout>();
  private onDue: ((timerId: string) => void) | undefined;

  /** Who to call when a deadline comes (the timers service, which fires the timer in a transaction). */
  setHandler(onDue: (timerId: string) => void): void {
    this.onDue = onDue;
  }

  /** Replaces the timer's timeout; `at` null stops it. */
  schedule(timerId: string, at: number | null): void {
    this.cancel(timerId);
    if (at === null) return;
    const wait = Math.min(Math.max(0, at - Date.now()), MAX_TIMEOUT_MS);
    this.handles.set(
      timerId,
      setTimeout(() => {
        this.handles.delete(timerId);
        if (Date.now() < at) return this.schedule(timerId, at);
        try {
          this.onDue?.(timerId);
        } catch (error) {
          this.logger.error(
            `Firing timer ${timerId} failed: ${error instanceof Error ? error.message : String(error)}`,
          );
        }
      }, wait),
    );
  }

  cancel(timerId: string): void {
    const handle = this.handles.get(timerId);
    if (handle) clearTimeout(handle);
    this.handles.delete(timerId);
  }

  get size(): number {
    return this.handles.size;
  }

  onApplicationShutdown(): void {
    for (const handle of this.handles.values()) clearTimeout(handle);
    this.handles.clear();
  }
}
