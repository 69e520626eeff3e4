import { altitudeInMetres } from './altitude.js';
import type { Altitude } from './kitchen.js';

/** Sea-level standard pressure, Pa (ICAO Doc 7488 / ISO 2533). */
export const SEA_LEVEL_PRESSURE_PA = 101325;
const SEA_LEVEL_TEMPERATURE_K = 288.15;
const LAPSE_RATE_K_PER_M = 0.0065;
const PRESSURE_EXPONENT = 5.255876;
/** Top of the troposphere, m: the one-layer formula below holds only up to here. */
const TROPOPAUSE_M = 11000;

/**
 * Pressure of the ICAO standard atmosphere at altitude H metres, in pascals:
 * p = 101325 x (1 - 0.0065 H / 288.15)^5.255876 (ICAO Doc 7488; ISO 2533; US Standard Atmosphere 1976).
 * H is strictly geopotential altitude; at kitchen heights it differs from height above sea level by under 0.1 %.
 */
export function standardAtmospherePressurePa(metres: number): number {
  if (!Number.isFinite(metres) || metres < -5000 || metres > TROPOPAUSE_M) {
    throw new RangeError(`The standard-atmosphere formula applies from -5,000 m to ${TROPOPAUSE_M} m; got ${metres} m`);
  }
  return SEA_LEVEL_PRESSURE_PA * (1 - (LAPSE_RATE_K_PER_M * metres) / SEA_LEVEL_TEMPERATURE_K) ** PRESSURE_EXPONENT;
}

/** Coefficients n1..n10 of the IAPWS-IF97 saturation-pressure equation (region 4, Table 34). */
const N = [
  0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.1202082470247e5, -0.32325550322333e7,
  0.1491510861353e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
] as const;
const [n1, n2, n3, n4, n5, n6, n7, n8, n9, n10] = N;

/** IAPWS-IF97 region 4 validity: from the triple point to the critical point. */
export const IF97_REGION4 = { minK: 273.15, maxK: 647.096, minMPa: 611.213e-6, maxMPa: 22.064 } as const;

/**
 * Saturation pressure of water at temperature T, in MPa: IAPWS-IF97 region 4, basic equation (Eq. 30).
 * Valid from 273.15 K to 647.096 K.
 */
export function saturationPressureMPa(kelvin: number): number {
  if (!(kelvin >= IF97_REGION4.minK && kelvin <= IF97_REGION4.maxK)) {
    throw new RangeError(
      `IAPWS-IF97 region 4 covers ${IF97_REGION4.minK} K to ${IF97_REGION4.maxK} K; got ${kelvin} K`,
    );
  }
  const theta = kelvin + n9 / (kelvin - n10);
  const A = theta ** 2 + n1 * theta + n2;
  const B = n3 * theta ** 2 + n4 * theta + n5;
  const C = n6 * theta ** 2 + n7 * theta + n8;
  return ((2 * C) / (-B + Math.sqrt(B ** 2 - 4 * A * C))) ** 4;
}

/**
 * Saturation (boiling) temperature of water at pressure p, in kelvin: IAPWS-IF97 region 4, backward
 * equation (Eq. 31). Valid from 611.213 Pa to 22.064 MPa.
 */
export function saturationTemperatureK(megapascals: number): number {
  if (!(megapascals >= IF97_REGION4.minMPa && megapascals <= IF97_REGION4.maxMPa)) {
    throw new RangeError(
      `IAPWS-IF97 region 4 covers ${IF97_REGION4.minMPa} MPa to ${IF97_REGION4.maxMPa} MPa; got ${megapascals} MPa`,
    );
  }
  const beta = megapascals ** 0.25;
  const E = beta ** 2 + n3 * beta + n6;
  const F = n1 * beta ** 2 + n4 * beta + n7;
  const G = n2 * beta ** 2 + n5 * beta + n8;
  const D = (2 * G) / (-F - Math.sqrt(F ** 2 - 4 * E * G));
  return (n10 + D - Math.sqrt((n10 + D) ** 2 - 4 * (n9 + n10 * D))) / 2;
}

export interface BoilingPoint {
  /** Standard-atmosphere pressure at the altitude, Pa. */
  pressurePa: number;
  kelvin: number;
  celsius: number;
  fahrenheit: number;
}

/** Kelvin to degrees Celsius and Fahrenheit, by the definitions of the scales (0 °C = 273.15 K; °F = 1.8 °C + 32). */
export function fromKelvin(kelvin: number): { celsius: number; fahrenheit: number } {
  const celsius = kelvin - 273.15;
  return { celsius, fahrenheit: celsius * 1.8 + 32 };
}

/**
 * The temperature at which water boils at an altitude on a standard day: the ICAO standard-atmosphere pressure,
 * then the IAPWS-IF97 saturation temperature. Weather moves the real value by a degree or so either way.
 */
export function boilingPoint(altitude: Altitude): BoilingPoint {
  const pressurePa = standardAtmospherePressurePa(altitudeInMetres(altitude));
  const kelvin = saturationTemperatureK(pressurePa / 1e6);
  return { pressurePa, kelvin, ...fromKelvin(kelvin) };
}
