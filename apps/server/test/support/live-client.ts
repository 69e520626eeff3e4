import { randomUUID } from 'node:crypto';
import type { Ack, ClientToServerEvents, JournalEvent, ServerToClientEvents } from '@jarday/contracts';
import { io, type Socket } from 'socket.io-client';

export type LiveClient = Socket<ServerToClientEvents, ClientToServerEvents> & {
  /** Every `day:event` this client received, in arrival order. */
  received: JournalEvent[];
};

/** A real socket.io client, as a device would connect: the access token and a device id in the handshake. */
export function connectLive(
  url: string,
  token: string,
  deviceId = `dev-${randomUUID().slice(0, 8)}`,
): Promise<LiveClient> {
  const socket = io(url, {
    path: '/socket.io',
    auth: { token, deviceId },
    transports: ['websocket'],
    reconnection: false,
    forceNew: true,
  }) as LiveClient;
  socket.received = [];
  socket.on('day:event', (e) => socket.received.push(e));
  return new Promise((resolve, reject) => {
    socket.once('connect', () => resolve(socket));
    socket.once('connect_error', (err) => reject(err));
  });
}

/** Emits and waits for the ack (socket.io's own timeout turns a silent server into a test failure). */
export function call<T>(socket: Socket, event: string, payload: unknown): Promise<Ack<T>> {
  return socket.timeout(5000).emitWithAck(event, payload) as Promise<Ack<T>>;
}

/** The ack's data, or a failure that shows the error. */
export async function ok<T>(socket: Socket, event: string, payload: unknown): Promise<T> {
  const answer = await call<T>(socket, event, payload);
  if ('error' in answer) throw new Error(`${event} refused: ${JSON.stringify(answer.error)}`);
  return answer.data;
}

/** Waits until the client has received an event matching `match`. */
export async function waitForEvent(
  client: LiveClient,
  match: (e: JournalEvent) => boolean,
  ms = 5000,
): Promise<JournalEvent> {
  const deadline = Date.now() + ms;
  for (;;) {
    const found = client.received.find(match);
    if (found) return found;
    if (Date.now() > deadline)
      throw new Error(`no matching event; got ${client.received.map((e) => e.type).join(', ')}`);
    await new Promise((r) => setTimeout(r, 10));
  }
}

export const command = (dayId: string, timerId: string, cmd: object, commandId: string = randomUUID()) => ({
  commandId,
  dayId,
  timerId,
  command: cmd,
});
