/**
 * A device's clock offset from the server, by NTP's on-wire method (RFC 5905, section 8): the device notes t1 when it
 * sends a ping, the server t2 when it receives it and t3 when it answers, the device t4 when the answer arrives.
 * t1 and t4 are device time, t2 and t3 server time, all in epoch ms.
 */
export interface ClockSample {
  t1: number;
  t2: number;
  t3: number;
  t4: number;
}

export interface ClockMeasurement {
  /** Server time minus device time: add it to the device clock to get server time. */
  offsetMs: number;
  /** Round-trip time on the network, without the server's own processing time. */
  delayMs: number;
}

/**
 * RFC 5905: offset = ((t2 - t1) + (t3 - t4)) / 2 and delay = (t4 - t1) - (t3 - t2). The offset is exact when the
 * two network legs take equally long; otherwise it is off by half their difference, so by at most delay / 2.
 */
export function measureClock({ t1, t2, t3, t4 }: ClockSample): ClockMeasurement {
  return { offsetMs: (t2 - t1 + (t3 - t4)) / 2, delayMs: t4 - t1 - (t3 - t2) };
}

/** Samples slower than this are dropped: their error bound (delay / 2) would be worse than a guess. */
export const DEFAULT_MAX_DELAY_MS = 10_000;
/** NTP's clock filter keeps the last eight samples (RFC 5905, section 10). */
export const DEFAULT_FILTER_SIZE = 8;

export type ClockRejection = 'not-finite' | 'negative-delay' | 'server-time-reversed' | 'too-slow';

/** Why a sample cannot be trusted, or null when it can. */
export function rejectClockSample(sample: ClockSample, maxDelayMs = DEFAULT_MAX_DELAY_MS): ClockRejection | null {
  if (![sample.t1, sample.t2, sample.t3, sample.t4].every(Number.isFinite)) return 'not-finite';
  if (sample.t3 < sample.t2) return 'server-time-reversed';
  const { offsetMs, delayMs } = measureClock(sample);
  // Finite stamps can still overflow when subtracted (think ±1e308).
  if (!Number.isFinite(offsetMs) || !Number.isFinite(delayMs)) return 'not-finite';
  if (delayMs < 0) return 'negative-delay';
  if (delayMs > maxDelayMs) return 'too-slow';
  return null;
}

/** The best-of-N filter, as plain immutable data. */
export interface ClockFilter {
  readonly size: number;
  readonly maxDelayMs: number;
  /** The last accepted measurements, oldest first, at most `size`. */
  readonly samples: readonly ClockMeasurement[];
}

/** An empty filter keeping the last `size` samples (default 8) and dropping any slower than `maxDelayMs` (10 s). */
export function createClockFilter(options: { size?: number; maxDelayMs?: number } = {}): ClockFilter {
  const size = options.size ?? DEFAULT_FILTER_SIZE;
  const maxDelayMs = options.maxDelayMs ?? DEFAULT_MAX_DELAY_MS;
  if (!Number.isInteger(size) || size < 1) throw new RangeError('The clock filter keeps at least one sample');
  if (!(maxDelayMs > 0)) throw new RangeError('The largest delay must be above zero');
  return { size, maxDelayMs, samples: [] };
}

/**
 * Add a sample: kept if trustworthy (the oldest falls out beyond `size`), otherwise dropped with its reason.
 */
export function addClockSample(
  filter: ClockFilter,
  sample: ClockSample,
): { filter: ClockFilter; rejected: ClockRejection | null } {
  const rejected = rejectClockSample(sample, filter.maxDelayMs);
  if (rejected) return { filter, rejected };
  const samples = [...filter.samples, measureClock(sample)].slice(-filter.size);
  return { filter: { ...filter, samples }, rejected: null };
}

/**
 * The estimate: the offset of the kept sample with the smallest delay, since the shortest round trip has the
 * tightest error bound (the idea of NTP's clock filter, RFC 5905 section 10). On a tie the newer sample wins.
 * Null until a sample has been kept.
 */
export function clockEstimate(filter: ClockFilter): ClockMeasurement | null {
  let best: ClockMeasurement | null = null;
  for (const m of filter.samples) if (best === null || m.delayMs <= best.delayMs) best = m;
  return best;
}

/** Server time now, from the device's clock and the estimated offset. */
export function serverNow(deviceNow: number, offsetMs: number): number {
  return deviceNow + offsetMs;
}
