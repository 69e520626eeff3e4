import { liveDeviceId } from './device-id';
import type { Ack, AckCallback, ClientToServerEvents, LiveError, ServerToClientEvents } from '@jarday/contracts';
import { io, type Socket } from 'socket.io-client';

/** The one live connection of this tab, typed by the shared contract. */
export type LiveSocket = Socket<ServerToClientEvents, ClientToServerEvents>;
export type LiveEvent = keyof ClientToServerEvents;
export type LivePayload<E extends LiveEvent> = Parameters<ClientToServerEvents[E]>[0];
export type LiveAnswer<E extends LiveEvent> =
  Parameters<ClientToServerEvents[E]>[1] extends AckCallback<infer T> ? T : never;

/** How the socket gets the signed-in person's access token; bound by the routes that open a live day. */
export interface LiveAuth {
  getToken: () => string | null;
  /** A fresh access token, or null when the session is gone. */
  renew: () => Promise<string | null>;
  /** Calls back whenever the session store holds a new token; returns the unsubscribe. */
  onToken: (listener: (token: string | null) => void) => () => void;
}

/** Failures that happen on this side of the wire, before or instead of a server answer. */
export { liveDeviceId };

export type DeviceError = { code: 'offline' | 'no_answer'; message: string };
export type LiveResult<T> = { data: T } | { error: LiveError | DeviceError };

const signedOut: LiveAuth = {
  getToken: () => null,
  renew: () => Promise.resolve(null),
  onToken: () => () => undefined,
};
let auth: LiveAuth = signedOut;
let socket: LiveSocket | null = null;

/** Connects the live socket to the session; returns a function that disconnects it. */
export function bindLiveAuth(next: LiveAuth): () => void {
  auth = next;
  return () => {
    if (auth === next) auth = signedOut;
  };
}

export const liveAuth = (): LiveAuth => auth;

/**
 * The tab's socket, made on first use and not connected until asked. The handshake reads the token at every
 * (re)connect, so a reconnect after a renewal presents the new one.
 */
export function getLiveSocket(): LiveSocket {
  socket ??= io({
    path: '/socket.io',
    autoConnect: false,
    // A WebSocket first (one connection for the whole day); long-polling only where a network blocks it.
    transports: ['websocket', 'polling'],
    tryAllTransports: true,
    auth: (send) => send({ token: auth.getToken() ?? '', deviceId: liveDeviceId() }),
  });
  return socket;
}

const NO_ANSWER_MS = 5_000;

/**
 * Sends one message and waits for its answer. Never queued while offline: a "Rolling boil" replayed minutes later
 * would start the process at the wrong moment, so an offline tap is refused at once and the cook taps again. A
 * silent server gets one retry with the same payload (commands carry their id, so the server acts once).
 */
export async function requestLive<E extends LiveEvent>(
  target: Pick<LiveSocket, 'connected' | 'timeout'>,
  event: E,
  payload: LivePayload<E>,
  retries = 1,
): Promise<LiveResult<LiveAnswer<E>>> {
  for (let attempt = 0; ; attempt += 1) {
    if (!target.connected) {
      return {
        error: {
          code: 'offline',
          message: 'Not connected to the kitchen: nothing was sent. Tap again once the board is back.',
        },
      };
    }
    try {
      const timed = target.timeout(NO_ANSWER_MS) as unknown as {
        emitWithAck: (e: E, p: LivePayload<E>) => Promise<Ack<LiveAnswer<E>>>;
      };
      return await timed.emitWithAck(event, payload);
    } catch {
      if (attempt >= retries) {
        return {
          error: { code: 'no_answer', message: 'The server did not answer. Check the board before tapping again.' },
        };
      }
    }
  }
}
