import type { JournalEvent, ServerToClientEvents } from '@jarday/contracts';
import { Injectable, Logger } from '@nestjs/common';

/* eslint-disable @typescript-eslint/no-explicit-any -- the publisher only emits, whatever the other event maps are */
import type { Server } from 'socket.io';

/** The room every device of a day joins. */
export const dayRoom = (dayId: string) => `day:${dayId}`;

/**
 * How services reach devices without holding a socket: the gateway attaches the socket.io server at start-up,
 * services publish journal events to a day's room after their transaction commits.
 */
@Injectable()
export class LivePublisher {
  private readonly logger = new Logger('LivePublisher');
  private server: Server<any, ServerToClientEvents, any, any> | undefined;

  attach(server: Server<any, ServerToClientEvents, any, any>): void {
    this.server = server;
  }

  publish(events: readonly JournalEvent[]): void {
    if (!this.server) {
      if (events.length > 0) this.logger.debug('No socket server attached: events stay in the journal only');
      return;
    }
    for (const event of events) this.server.to(dayRoom(event.dayId)).emit('day:event', event);
  }
}
