import {
  type Ack,
  type ClientEventName,
  CLIENT_EVENT_SCHEMAS,
  type ClientToServerEvents,
  type ClockPong,
  type DayJoined,
  type LiveError,
  liveHandshakeSchema,
  type ServerToClientEvents,
  type StepMark,
  type TimerAnswer,
} from '@jarday/contracts';
import { Logger } from '@nestjs/common';
import {
  ConnectedSocket,
  MessageBody,
  type OnGatewayConnection,
  type OnGatewayInit,
  SubscribeMessage,
  WebSocketGateway,
} from '@nestjs/websockets';
import type { Server, Socket } from 'socket.io';
import type { z } from 'zod';
import { TokensService } from '../auth/tokens.service.js';
import { LivePublisher } from '../realtime/live-publisher.js';
import { LiveDaysService, type SocketSession } from './live-days.service.js';

type LiveSocket = Socket<ClientToServerEvents, ServerToClientEvents, Record<string, never>, SocketSession>;
type LiveServer = Server<ClientToServerEvents, ServerToClientEvents, Record<string, never>, SocketSession>;
type Payload<E extends ClientEventName> = z.output<(typeof CLIENT_EVENT_SCHEMAS)[E]>;

/** Largest message a device may send; the biggest real command is well under 2 KB. */
const MAX_MESSAGE_BYTES = 16 * 1024;

const invalid = (error: z.ZodError): { error: LiveError } => ({
  error: {
    code: 'validation_failed',
    message: 'The message is not valid',
    issues: error.issues.slice(0, 20).map((i) => ({ path: i.path.map(String).join('.'), message: i.message })),
  },
});

/**
 * Transport only: authenticate the handshake, validate each message against the contract's schema, hand it to
 * the live-days service, and answer the ack. Nothing a handler throws reaches a device but a generic message.
 */
@WebSocketGateway({ path: '/socket.io', serveClient: false, maxHttpBufferSize: MAX_MESSAGE_BYTES })
export class LiveGateway implements OnGatewayInit, OnGatewayConnection {
  private readonly logger = new Logger('LiveGateway');

  constructor(
    private readonly tokens: TokensService,
    private readonly live: LiveDaysService,
    private readonly publisher: LivePublisher,
  ) {}

  afterInit(server: LiveServer): void {
    this.publisher.attach(server);
    server.use((socket: LiveSocket, next) => {
      const handshake = liveHandshakeSchema.safeParse(socket.handshake.auth);
      if (!handshake.success) return next(new Error('Sign in first: the connection needs a token and a device id'));
      this.tokens
        .verifyAccessUntil(handshake.data.token)
        .then((verified) => {
          if (!verified) return next(new Error('Your sign-in has expired or is not valid: sign in again'));
          socket.data = {
            user: verified.user,
            deviceId: handshake.data.deviceId,
            expiresAt: verified.expiresAt,
            days: new Map(),
          };
          next();
        })
        .catch(() => next(new Error('Sign-in could not be checked')));
    });
  }

  handleConnection(socket: LiveSocket): void {
    // Unknown events get an answer too, so a confused or hostile client learns nothing and hangs on nothing.
    socket.onAny((event: string, ...args: unknown[]) => {
      if (Object.hasOwn(CLIENT_EVENT_SCHEMAS, event)) return;
      const ack = args.at(-1);
      if (typeof ack === 'function') {
        (ack as (a: Ack<never>) => void)({ error: { code: 'validation_failed', message: 'Unknown event' } });
      }
    });
  }

  @SubscribeMessage('day:join')
  join(@ConnectedSocket() socket: LiveSocket, @MessageBody() body: unknown): Promise<Ack<DayJoined>> {
    return this.handle(socket, 'day:join', body, (p) => this.live.join(socket, p.dayId, p.sinceSeq));
  }

  @SubscribeMessage('day:leave')
  leave(@ConnectedSocket() socket: LiveSocket, @MessageBody() body: unknown): Promise<Ack<{ dayId: string }>> {
    return this.handle(socket, 'day:leave', body, (p) => this.live.leave(socket, p.dayId));
  }

  @SubscribeMessage('timer:start')
  start(@ConnectedSocket() socket: LiveSocket, @MessageBody() body: unknown): Promise<Ack<TimerAnswer>> {
    return this.handle(socket, 'timer:start', body, (p) => this.live.start(socket.data, p.dayId, p.commandId, p.timer));
  }

  @SubscribeMessage('timer:command')
  command(@ConnectedSocket() socket: LiveSocket, @MessageBody() body: unknown): Promise<Ack<TimerAnswer>> {
    return this.handle(socket, 'timer:command', body, (p) =>
      this.live.command(socket.data, p.dayId, p.commandId, p.timerId, p.command),
    );
  }

  @SubscribeMessage('alarm:ack')
  acknowledge(@ConnectedSocket() socket: LiveSocket, @MessageBody() body: unknown): Promise<Ack<TimerAnswer>> {
    return this.handle(socket, 'alarm:ack', body, (p) =>
      this.live.command(socket.data, p.dayId, p.commandId, p.timerId, { type: 'acknowledge' }),
    );
  }

  @SubscribeMessage('step:confirm')
  confirmStep(@ConnectedSocket() socket: LiveSocket, @MessageBody() body: unknown): Promise<Ack<{ mark: StepMark }>> {
    return this.handle(socket, 'step:confirm', body, (p) => this.live.confirmStep(socket.data, p));
  }

  /** RFC 5905's server half: t2 on arrival, t3 on answer (the same instant here, as nothing happens between). */
  @SubscribeMessage('clock:ping')
  ping(@MessageBody() body: unknown): Ack<ClockPong> {
    const t2 = Date.now();
    const parsed = CLIENT_EVENT_SCHEMAS['clock:ping'].safeParse(body);
    if (!parsed.success) return invalid(parsed.error);
    return { data: { t1: parsed.data.t1, t2, t3: Date.now() } };
  }

  @SubscribeMessage('session:renew')
  async renew(
    @ConnectedSocket() socket: LiveSocket,
    @MessageBody() body: unknown,
  ): Promise<Ack<{ expiresAt: number }>> {
    const parsed = CLIENT_EVENT_SCHEMAS['session:renew'].safeParse(body);
    if (!parsed.success) return invalid(parsed.error);
    const verified = await this.tokens.verifyAccessUntil(parsed.data.token);
    if (!verified || verified.user.id !== socket.data.user.id) {
      return { error: { code: 'unauthorized', message: 'That token is not valid for this device: sign in again' } };
    }
    socket.data.expiresAt = verified.expiresAt;
    return { data: { expiresAt: verified.expiresAt } };
  }

  private async handle<E extends ClientEventName, T>(
    socket: LiveSocket,
    event: E,
    body: unknown,
    act: (payload: Payload<E>) => Ack<T> | Promise<Ack<T>>,
  ): Promise<Ack<T>> {
    if (Date.now() >= socket.data.expiresAt) {
      socket.emit('session:expired', { message: 'Your sign-in ran out: renew it to go on' });
      return { error: { code: 'unauthorized', message: 'Your sign-in ran out: renew it to go on' } };
    }
    const parsed = CLIENT_EVENT_SCHEMAS[event].safeParse(body);
    if (!parsed.success) return invalid(parsed.error);
    try {
      return await act(parsed.data as Payload<E>);
    } catch (error) {
      this.logger.error(`${event} failed: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
      return { error: { code: 'internal', message: 'Something went wrong on the server. It has been logged.' } };
    }
  }
}
