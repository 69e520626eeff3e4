import { describe, expect, it } from 'vitest';
import { gaugePressure } from './gauge-pressure.js';
import { ft, m } from './testing/published-recipes.js';

// Gauge pressure by altitude, USDA Complete Guide to Home Canning, Guide 1, and PNW 421 (confirmed), except the
// dial value for 8,001-10,000 ft, which is from memory (the USDA tables read stop at 8,000 ft).
describe('gaugePressure', () => {
  it.each([
    [0, 10],
    [1000, 10],
    [1001, 15],
    [2000, 15],
    [4001, 15],
    [8000, 15],
    [10000, 15],
  ])('weighted gauge at %d ft: %d lb', (feet, pounds) => {
    expect(gaugePressure('weighted', ft(feet))).toMatchObject({ ok: true, pounds, gauge: 'weighted' });
  });

  it.each([
    [0, 11],
    [1000, 11],
    [1001, 11],
    [2000, 11],
    [2001, 12],
    [4000, 12],
    [4001, 13],
    [6000, 13],
    [6001, 14],
    [8000, 14],
  ])('dial gauge at %d ft: %d lb', (feet, pounds) => {
    expect(gaugePressure('dial', ft(feet))).toMatchObject({ ok: true, pounds, gauge: 'dial' });
  });

  it('dial gauge at 8,001-10,000 ft: 15 lb (from memory)', () => {
    expect(gaugePressure('dial', ft(8001))).toMatchObject({ ok: true, pounds: 15 });
    expect(gaugePressure('dial', ft(10000))).toMatchObject({ ok: true, pounds: 15 });
  });

  it('labels the pressure band used', () => {
    expect(gaugePressure('dial', ft(3500))).toMatchObject({ band: { label: '2,001–4,000 ft', index: 2 } });
    expect(gaugePressure('weighted', ft(3500))).toMatchObject({ band: { label: '1,001–10,000 ft', index: 1 } });
  });

  it('reads metric altitudes with the same inclusive bounds', () => {
    expect(gaugePressure('weighted', m(304.8))).toMatchObject({ pounds: 10 }); // exactly 1,000 ft
    expect(gaugePressure('weighted', m(305))).toMatchObject({ pounds: 15 });
    expect(gaugePressure('dial', m(609.6))).toMatchObject({ pounds: 11 }); // exactly 2,000 ft
    expect(gaugePressure('dial', m(610))).toMatchObject({ pounds: 12 });
  });

  it('refuses above 10,000 ft for both gauges', () => {
    const refusal = {
      ok: false,
      reason: {
        code: 'altitude-beyond-table',
        message:
          'The pressure tables stop at 10,000 ft; Jarday gives no canning pressure above that. Ask your local extension service.',
      },
    };
    expect(gaugePressure('weighted', ft(10001))).toEqual(refusal);
    expect(gaugePressure('dial', ft(10000.5))).toEqual(refusal);
    expect(gaugePressure('dial', m(3049))).toEqual(refusal);
  });
});
