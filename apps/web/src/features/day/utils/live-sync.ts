import type { DayJoined, DaySnapshot, JournalEvent } from '@jarday/contracts';
import { requestLive, type LiveAuth, type LiveSocket } from '../../../lib/socket';
import { useLiveStore } from '../stores/live-store';
import { createClockSync } from './clock-sync';
import { changesDayView } from './live-state';

export interface LiveSyncDeps {
  socket: LiveSocket;
  auth: LiveAuth;
  /** A batch, a load or the day's status changed: refetch the REST view of the day. */
  onDayChanged: () => void;
  store?: typeof useLiveStore;
}

const SIGNED_OUT = 'Your sign-in has ended: sign in again to follow the day.';

/**
 * Keeps the live store in step with the server for one day: joins on every (re)connect with the last `seq` seen,
 * applies broadcasts in order, re-joins on a gap, follows the token, and measures the clock. Returns the stop.
 */
export function startLiveSync(dayId: string, { socket, auth, onDayChanged, store = useLiveStore }: LiveSyncDeps) {
  const state = () => store.getState();
  let joining = false;
  let joinAgain = false;
  let held: unknown[] = [];
  let stopped = false;

  const clock = createClockSync({
    ping: async (t1) => {
      const answer = await requestLive(socket, 'clock:ping', { t1 }, 0);
      return 'data' in answer ? answer.data : null;
    },
    onEstimate: (offset, delay) => state().setClock(offset, delay),
  });

  const handle = (event: unknown) => {
    // While a join is out, its snapshot will cover what arrives meanwhile; hold the rest for after it.
    if (joining) return void held.push(event);
    const outcome = state().receive(event);
    if (outcome === 'gap') void join();
    else if (outcome === 'applied' && changesDayView(event as JournalEvent)) onDayChanged();
  };

  const join = async () => {
    if (joining) return void (joinAgain = true);
    joining = true;
    const known = state();
    const sinceSeq = known.dayId === dayId && known.seq > 0 ? known.seq : undefined;
    const answer = await requestLive(socket, 'day:join', sinceSeq === undefined ? { dayId } : { dayId, sinceSeq });
    joining = false;
    if (stopped) return;
    if ('error' in answer) {
      // Offline or unanswered: the next connect joins again. A refusal (not a member, no such day) stands.
      if (answer.error.code !== 'offline' && answer.error.code !== 'no_answer') {
        state().setConnection('refused', answer.error.message);
      }
      held = [];
      return;
    }
    applyJoin(answer.data);
  };

  const applyJoin = (joined: DayJoined) => {
    state().applyJoined(joined);
    onDayChanged();
    const pending = held;
    held = [];
    for (const event of pending) handle(event);
    if (joinAgain) {
      joinAgain = false;
      void join();
    }
  };

  const renewAndSend = async () => {
    const token = await auth.renew();
    if (!token) return state().setConnection('refused', SIGNED_OUT);
    if (socket.connected) void requestLive(socket, 'session:renew', { token });
  };

  const onConnect = () => {
    state().setConnection('connecting');
    void join();
    clock.burst();
  };
  const onDisconnect = () => {
    state().setConnection(navigator.onLine ? 'reconnecting' : 'offline');
  };
  const onConnectError = () => {
    // A refused handshake (expired token) is not retried by socket.io itself: renew, then try once more.
    if (socket.active) return state().setConnection(navigator.onLine ? 'reconnecting' : 'offline');
    void auth.renew().then((token) => {
      if (stopped) return;
      if (!token) return state().setConnection('refused', SIGNED_OUT);
      socket.connect();
    });
  };
  const onSnapshot = (snapshot: DaySnapshot) => {
    if (snapshot.dayId === dayId) state().applySnapshot(snapshot);
  };
  const onExpired = () => void renewAndSend();
  // The browser knows first when the Wi-Fi drops; waiting for socket.io's heartbeat would take many seconds.
  const onOffline = () => {
    socket.disconnect();
    state().setConnection('offline');
  };
  const onOnline = () => {
    state().setConnection('reconnecting');
    socket.connect();
  };
  const onVisible = () => {
    if (document.visibilityState !== 'visible') return;
    if (!socket.connected && navigator.onLine) socket.connect();
    else if (socket.connected) clock.burst();
  };

  state().reset(dayId);
  socket.on('connect', onConnect);
  socket.on('disconnect', onDisconnect);
  socket.on('connect_error', onConnectError);
  socket.on('day:event', handle);
  socket.on('day:snapshot', onSnapshot);
  socket.on('session:expired', onExpired);
  const stopToken = auth.onToken((token) => {
    if (token && socket.connected) void requestLive(socket, 'session:renew', { token });
  });
  window.addEventListener('offline', onOffline);
  window.addEventListener('online', onOnline);
  document.addEventListener('visibilitychange', onVisible);
  if (socket.connected) onConnect();
  else if (navigator.onLine) socket.connect();
  else state().setConnection('offline');

  return () => {
    stopped = true;
    clock.stop();
    stopToken();
    socket.off('connect', onConnect);
    socket.off('disconnect', onDisconnect);
    socket.off('connect_error', onConnectError);
    socket.off('day:event', handle);
    socket.off('day:snapshot', onSnapshot);
    socket.off('session:expired', onExpired);
    window.removeEventListener('offline', onOffline);
    window.removeEventListener('online', onOnline);
    document.removeEventListener('visibilitychange', onVisible);
    if (socket.connected) void requestLive(socket, 'day:leave', { dayId }, 0);
    socket.disconnect();
    state().setConnection('idle');
  };
}
