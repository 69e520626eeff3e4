import { describe, expect, it } from 'vitest';
import {
  addClockSample,
  clockEstimate,
  createClockFilter,
  DEFAULT_FILTER_SIZE,
  measureClock,
  rejectClockSample,
  serverNow,
  type ClockFilter,
  type ClockSample,
} from './clock-sync.js';
import { make, MIN, run, T0, cmd } from './testing/fixtures.js';
import { remainingMs } from './schedule.js';

// RFC 5905, section 8: offset = ((t2 - t1) + (t3 - t4)) / 2, delay = (t4 - t1) - (t3 - t2). Examples worked by hand.
describe('the four-timestamp formula', () => {
  it('symmetric legs: server 2,000 ms ahead, 40 ms each way, 5 ms in the server', () => {
    // t1 = 1,000 (device); t2 = 1,000 + 40 + 2,000 = 3,040; t3 = 3,045 (server); t4 = 1,000 + 40 + 5 + 40 = 1,085.
    // offset = (2,040 + (3,045 - 1,085)) / 2 = (2,040 + 1,960) / 2 = 2,000; delay = 85 - 5 = 80.
    expect(measureClock({ t1: 1_000, t2: 3_040, t3: 3_045, t4: 1_085 })).toEqual({ offsetMs: 2_000, delayMs: 80 });
  });

  it('asymmetric legs: server 300 ms behind, 100 ms out, 20 ms back, 10 ms in the server', () => {
    // t1 = 50,000; t2 = 50,000 + 100 - 300 = 49,800; t3 = 49,810; t4 = 50,000 + 100 + 10 + 20 = 50,130.
    // offset = ((49,800 - 50,000) + (49,810 - 50,130)) / 2 = (-200 - 320) / 2 = -260: off by (100 - 20) / 2 = 40.
    // delay = 130 - 10 = 120, so the error bound delay / 2 = 60 holds.
    const m = measureClock({ t1: 50_000, t2: 49_800, t3: 49_810, t4: 50_130 });
    expect(m).toEqual({ offsetMs: -260, delayMs: 120 });
    expect(Math.abs(m.offsetMs - -300)).toBeLessThanOrEqual(m.delayMs / 2);
  });

  it('clocks that agree on a 30 ms round trip give a zero offset', () => {
    expect(measureClock({ t1: 10, t2: 25, t3: 25, t4: 40 })).toEqual({ offsetMs: 0, delayMs: 30 });
  });

  it('serverNow adds the offset to the device clock', () => {
    expect(serverNow(1_085, 2_000)).toBe(3_085);
    expect(serverNow(50_130, -260)).toBe(49_870);
  });
});

describe('untrustworthy samples', () => {
  it('drops negative delays, a server clock running backwards, absurd delays and non-numbers', () => {
    // delay = (1,010 - 1,000) - (3,100 - 3,040) = 10 - 60 = -50: impossible, the stamps are wrong.
    expect(rejectClockSample({ t1: 1_000, t2: 3_040, t3: 3_100, t4: 1_010 })).toBe('negative-delay');
    expect(rejectClockSample({ t1: 0, t2: 100, t3: 90, t4: 500 })).toBe('server-time-reversed');
    expect(rejectClockSample({ t1: 0, t2: 5, t3: 5, t4: 10_001 })).toBe('too-slow');
    expect(rejectClockSample({ t1: 0, t2: 5, t3: 5, t4: 10_000 })).toBeNull();
    expect(rejectClockSample({ t1: 0, t2: 5, t3: 5, t4: 2_000 }, 1_000)).toBe('too-slow');
    expect(rejectClockSample({ t1: Number.NaN, t2: 5, t3: 5, t4: 10 })).toBe('not-finite');
    expect(rejectClockSample({ t1: 0, t2: Number.POSITIVE_INFINITY, t3: 5, t4: 10 })).toBe('not-finite');
    // Finite stamps whose differences overflow: (t4 - t1) - (t3 - t2) = Infinity - Infinity = NaN.
    expect(rejectClockSample({ t1: -1.7e308, t2: -1.7e308, t3: 1.7e308, t4: 1.7e308 })).toBe('not-finite');
  });
});

describe('the best-of-N filter', () => {
  // A ping with one-way legs `out` and `back` to a server `offset` ahead, sent at device time `t1`.
  const ping = (t1: number, offset: number, out: number, back: number): ClockSample => ({
    t1,
    t2: t1 + out + offset,
    t3: t1 + out + offset + 2,
    t4: t1 + out + 2 + back,
  });
  const feed = (filter: ClockFilter, samples: ClockSample[]) =>
    samples.reduce((f, s) => addClockSample(f, s).filter, filter);

  it('is empty at first and keeps NTP’s eight samples by default', () => {
    const filter = createClockFilter();
    expect(clockEstimate(filter)).toBeNull();
    expect(filter.size).toBe(DEFAULT_FILTER_SIZE);
    expect(DEFAULT_FILTER_SIZE).toBe(8);
  });

  it('takes the offset of the sample with the smallest delay', () => {
    // Delays 150, 30 and 400 ms: the 30 ms sample (15 out, 15 back) measures the true 700 ms exactly.
    const filter = feed(createClockFilter(), [
      ping(0, 700, 100, 50),
      ping(1_000, 700, 15, 15),
      ping(2_000, 700, 390, 10),
    ]);
    expect(filter.samples.map((s) => s.delayMs)).toEqual([150, 30, 400]);
    expect(clockEstimate(filter)).toEqual({ offsetMs: 700, delayMs: 30 });
  });

  it('keeps only the last N, so a good old sample ages out', () => {
    const filter = feed(createClockFilter({ size: 2 }), [
      ping(0, 700, 5, 5),
      ping(1_000, 700, 60, 20),
      ping(2_000, 700, 40, 40),
    ]);
    expect(filter.samples).toHaveLength(2);
    // The 10 ms sample fell out; of 80 and 80 the newer wins: symmetric legs, so exactly 700.
    expect(clockEstimate(filter)).toEqual({ offsetMs: 700, delayMs: 80 });
  });

  it('leaves a rejected sample out and says why', () => {
    const start = feed(createClockFilter(), [ping(0, 700, 20, 20)]);
    const { filter, rejected } = addClockSample(start, { t1: 5_000, t2: 4_000, t3: 4_000, t4: 4_999 });
    expect(rejected).toBe('negative-delay');
    expect(filter).toBe(start);
  });

  it('refuses a filter of no samples or no delay', () => {
    expect(() => createClockFilter({ size: 0 })).toThrow('The clock filter keeps at least one sample');
    expect(() => createClockFilter({ maxDelayMs: 0 })).toThrow('The largest delay must be above zero');
  });

  it('lets a device count down in server time', () => {
    // The server's timer ends at T0 + 45 min; the device clock is 2 s behind the server's.
    const timer = run(run(make({ kind: 'process', label: 'L', testedMs: 45 * MIN }), cmd.heating, T0), cmd.boil, T0);
    const estimate = clockEstimate(feed(createClockFilter(), [ping(T0 - 2_000, 2_000, 30, 30)]));
    const deviceNow = T0 + 10 * MIN - 2_000;
    expect(remainingMs(timer, serverNow(deviceNow, estimate!.offsetMs))).toBe(35 * MIN);
  });
});
