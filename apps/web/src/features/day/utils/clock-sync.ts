import { addClockSample, clockEstimate, createClockFilter, type ClockFilter } from '@jarday/live';
import type { ClockPong } from '@jarday/contracts';

/** Pings in a burst when the link comes up, then one a minute to follow a drifting device clock. */
export const BURST_PINGS = 6;
const BURST_SPACING_MS = 250;
const STEADY_EVERY_MS = 60_000;

export interface ClockSyncDeps {
  /** Sends `clock:ping { t1 }`; null when it got no answer. */
  ping: (t1: number) => Promise<ClockPong | null>;
  onEstimate: (offsetMs: number, delayMs: number) => void;
  now?: () => number;
}

/**
 * Estimates this device's offset from the server with NTP's four timestamps (RFC 5905): t1 and t4 on the device,
 * t2 and t3 on the server, the best-of-N filter keeping the sample with the shortest round trip.
 */
export function createClockSync({ ping, onEstimate, now = () => Date.now() }: ClockSyncDeps) {
  let filter: ClockFilter = createClockFilter();
  let steady: ReturnType<typeof setInterval> | undefined;
  let burstRun = 0;

  const sample = async () => {
    const t1 = now();
    const pong = await ping(t1);
    if (!pong || pong.t1 !== t1) return;
    filter = addClockSample(filter, { t1, t2: pong.t2, t3: pong.t3, t4: now() }).filter;
    const best = clockEstimate(filter);
    if (best) onEstimate(best.offsetMs, best.delayMs);
  };

  const burst = async () => {
    const run = (burstRun += 1);
    for (let i = 0; i < BURST_PINGS && run === burstRun; i += 1) {
      await sample();
      await new Promise((r) => setTimeout(r, BURST_SPACING_MS));
    }
  };

  return {
    /** A fresh round of samples: on connect, and when a sleeping tablet wakes. */
    burst: () => {
      void burst();
      if (steady === undefined) steady = setInterval(() => void sample(), STEADY_EVERY_MS);
    },
    stop: () => {
      burstRun += 1;
      clearInterval(steady);
      steady = undefined;
    },
  };
}
