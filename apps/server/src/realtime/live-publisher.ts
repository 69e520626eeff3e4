import type { JournalEvent, ServerToClientEvents } from '@jarday/contracts';
import { Injectable, Logger } from '@nestjs/common';

/* eslint-disable @typescript-eslint/no-explicit-any -- the publisher only emits, whatever the other event maps are */
import type { Server } from 'socket.io';

/** The room every device of a day joins. */
export const dayRoom = (dayId: string) => `day:${dayId}`;

/** A server-side observer of published journal events. */
export type JournalListener = (events: readonly JournalEvent[]) => void;

/**
 * How services reach devices without holding a socket: the gateway attaches the socket.io server at start-up,
 * services publish journal events to a day's room after their transaction commits. Other modules (reminders, the
 * day-close mail) observe the same events through `subscribe`, without a socket of their own.
 */
@Injectable()
export class LivePublisher {
  private readonly logger = new Logger('LivePublisher');
  private server: Server<any, ServerToClientEvents, any, any> | undefined;
  private listeners: JournalListener[] = [];

  attach(server: Server<any, ServerToClientEvents, any, any>): void {
    this.server = server;
  }

  /**
   * Calls `listener` with every batch published from now on, after the devices were sent it. Listeners run
   * synchronously on the live path: they must only look and schedule their own work, never do it there.
   * Returns the unsubscribe function.
   */
  subscribe(listener: JournalListener): () => void {
    this.listeners = [...this.listeners, listener];
    return () => {
      this.listeners = this.listeners.filter((l) => l !== listener);
    };
  }

  publish(events: readonly JournalEvent[]): void {
    if (events.length === 0) return;
    if (this.server) {
      for (const event of events) this.server.to(dayRoom(event.dayId)).emit('day:event', event);
    } else {
      this.logger.debug('No socket server attached: events stay in the journal only');
    }
    // A copy-on-write array: a listener that unsubscribes while being called does not disturb this loop.
    const listeners = this.listeners;
    for (let i = 0; i < listeners.length; i++) {
      try {
        listeners[i]!(events);
      } catch (error) {
        this.logger.error(`A journal listener failed: ${error instanceof Error ? error.message : String(error)}`);
      }
    }
  }
}
