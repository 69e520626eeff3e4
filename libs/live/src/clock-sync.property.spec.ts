import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addClockSample, clockEstimate, createClockFilter, measureClock, type ClockSample } from './clock-sync.js';

// Integer milliseconds keep the arithmetic exact, so "equals" means equals.
const deviceTimeArb = fc.integer({ min: 0, max: 2_000_000_000_000 });
const offsetArb = fc.integer({ min: -1_000_000_000, max: 1_000_000_000 });
const legArb = fc.integer({ min: 0, max: 4_000 });
const serverWorkArb = fc.integer({ min: 0, max: 500 });

/** A true path: device sends at t1, the request takes `out`, the server works `work`, the answer takes `back`. */
function exchange(t1: number, offset: number, out: number, work: number, back: number): ClockSample {
  const t2 = t1 + out + offset;
  return { t1, t2, t3: t2 + work, t4: t1 + out + work + back };
}

describe('RFC 5905 estimate, properties', () => {
  it('with equal legs the estimate is the true offset, and the delay the two legs', () => {
    fc.assert(
      fc.property(deviceTimeArb, offsetArb, legArb, serverWorkArb, (t1, offset, leg, work) => {
        expect(measureClock(exchange(t1, offset, leg, work, leg))).toEqual({ offsetMs: offset, delayMs: 2 * leg });
      }),
    );
  });

  it('with unequal legs the error is half their difference, so never more than delay / 2', () => {
    fc.assert(
      fc.property(deviceTimeArb, offsetArb, legArb, serverWorkArb, legArb, (t1, offset, out, work, back) => {
        const { offsetMs, delayMs } = measureClock(exchange(t1, offset, out, work, back));
        expect(delayMs).toBe(out + back);
        expect(Math.abs(offsetMs - offset)).toBe(Math.abs(out - back) / 2);
        expect(Math.abs(offsetMs - offset)).toBeLessThanOrEqual(delayMs / 2);
      }),
    );
  });

  it('the filter picks the least-delay sample among the last N kept, with its error bound', () => {
    const pathArb = fc.record({ out: legArb, work: serverWorkArb, back: legArb });
    fc.assert(
      fc.property(
        offsetArb,
        fc.array(pathArb, { minLength: 1, maxLength: 20 }),
        fc.integer({ min: 1, max: 10 }),
        (offset, paths, size) => {
          const samples = paths.map((p, i) => exchange(1_000_000 + i * 60_000, offset, p.out, p.work, p.back));
          const filter = samples.reduce((f, s) => addClockSample(f, s).filter, createClockFilter({ size }));
          const kept = paths.slice(-size).map((p) => p.out + p.back);
          const estimate = clockEstimate(filter);
          expect(estimate?.delayMs).toBe(Math.min(...kept));
          expect(Math.abs((estimate?.offsetMs ?? Number.NaN) - offset)).toBeLessThanOrEqual(Math.min(...kept) / 2);
        },
      ),
    );
  });

  it('garbage never enters the estimate', () => {
    const garbageArb = fc.record({
      t1: fc.double(),
      t2: fc.double(),
      t3: fc.double(),
      t4: fc.double(),
    });
    fc.assert(
      fc.property(fc.array(garbageArb, { maxLength: 20 }), (samples) => {
        const filter = samples.reduce((f, s) => addClockSample(f, s).filter, createClockFilter());
        for (const m of filter.samples) {
          expect(Number.isFinite(m.offsetMs)).toBe(true);
          expect(m.delayMs).toBeGreaterThanOrEqual(0);
          expect(m.delayMs).toBeLessThanOrEqual(filter.maxDelayMs);
        }
      }),
    );
  });
});
