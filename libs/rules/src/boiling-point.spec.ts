import { describe, expect, it } from 'vitest';
import {
  boilingPoint,
  fromKelvin,
  saturationPressureMPa,
  saturationTemperatureK,
  standardAtmospherePressurePa,
} from './boiling-point.js';
import { ft, m } from './testing/published-recipes.js';

/** The value to 9 significant figures, as the IAPWS-IF97 verification tables print them. */
const sig9 = (x: number) => Number(x.toPrecision(9));

describe('IAPWS-IF97 region 4', () => {
  // Verification values of IAPWS-IF97 (Tables 35 and 36). references.md gives Tsat(0.1 MPa) and psat(300 K) and
  // marks them from memory; the other four are from memory too.
  it.each([
    [0.1, 372.755919],
    [1, 453.035632],
    [10, 584.149488],
  ])('backward equation (Eq. 31): Tsat(%d MPa) = %d K (from memory)', (mpa, kelvin) => {
    expect(sig9(saturationTemperatureK(mpa))).toBe(kelvin);
  });

  it.each([
    [300, 0.00353658941],
    [500, 2.63889776],
    [600, 12.3443146],
  ])('basic equation (Eq. 30): psat(%d K) = %d MPa (from memory)', (kelvin, mpa) => {
    expect(sig9(saturationPressureMPa(kelvin))).toBe(mpa);
  });

  it('the two equations invert each other along the saturation line', () => {
    for (const kelvin of [280, 350, 373.15, 450, 600, 640]) {
      expect(saturationTemperatureK(saturationPressureMPa(kelvin))).toBeCloseTo(kelvin, 6);
    }
  });

  it('refuses values outside region 4 (273.15-647.096 K; 611.213 Pa-22.064 MPa)', () => {
    expect(() => saturationPressureMPa(273)).toThrow(RangeError);
    expect(() => saturationPressureMPa(650)).toThrow(/647.096 K/);
    expect(() => saturationTemperatureK(0.0006)).toThrow(RangeError);
    expect(() => saturationTemperatureK(23)).toThrow(/22.064 MPa/);
    expect(() => saturationTemperatureK(Number.NaN)).toThrow(RangeError);
  });
});

describe('standard atmosphere (ICAO Doc 7488 / ISO 2533)', () => {
  it('is 101,325 Pa at sea level', () => {
    expect(standardAtmospherePressurePa(0)).toBe(101325);
  });

  it('follows p = 101325 (1 - 0.0065 H / 288.15)^5.255876', () => {
    // Worked by hand for H = 1,000 m: 1 - 6.5/288.15 = 0.9774423; ln = -0.0228160; x 5.255876 = -0.1199181;
    // exp = 0.8869930; x 101,325 Pa = 89,874.6 Pa.
    expect(standardAtmospherePressurePa(1000)).toBeCloseTo(89874.6, 0);
    expect(standardAtmospherePressurePa(-100)).toBeGreaterThan(101325);
  });

  it('refuses heights outside the one-layer troposphere formula', () => {
    expect(() => standardAtmospherePressurePa(12000)).toThrow(RangeError);
    expect(() => standardAtmospherePressurePa(Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});

describe('boilingPoint', () => {
  it('is 212 °F at sea level within 0.5 °F (Colorado State University extension, confirmed)', () => {
    const bp = boilingPoint(ft(0));
    expect(Math.abs(bp.fahrenheit - 212)).toBeLessThan(0.5);
    expect(bp.pressurePa).toBe(101325);
  });

  it('is 203 °F at 5,000 ft within 0.5 °F (Colorado State University extension, confirmed)', () => {
    expect(Math.abs(boilingPoint(ft(5000)).fahrenheit - 203)).toBeLessThan(0.5);
  });

  it('gives the same answer for feet and metres', () => {
    expect(boilingPoint(m(1524)).kelvin).toBeCloseTo(boilingPoint(ft(5000)).kelvin, 9);
  });

  it('falls as altitude rises', () => {
    const points = [0, 1000, 3000, 6000, 10000].map((feet) => boilingPoint(ft(feet)).celsius);
    for (let i = 1; i < points.length; i++) expect(points[i]).toBeLessThan(points[i - 1]!);
  });

  it('reports K, °C and °F consistently (0 °C = 273.15 K; °F = 1.8 °C + 32)', () => {
    const bp = boilingPoint(ft(3000));
    expect(bp.celsius).toBeCloseTo(bp.kelvin - 273.15, 12);
    expect(bp.fahrenheit).toBeCloseTo(bp.celsius * 1.8 + 32, 12);
    const water = fromKelvin(373.15);
    expect(water.celsius).toBeCloseTo(100, 12);
    expect(water.fahrenheit).toBeCloseTo(212, 12);
  });
});
