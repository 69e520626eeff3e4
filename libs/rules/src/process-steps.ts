import type { PackStyle } from './process-table.js';

/** Minutes jars rest in the open canner after a boiling-water process, heat off (Penn State extension guidance). */
export const BOILING_WATER_REST_MINUTES = 5;
/**
 * Minutes to wait after a pressure canner's gauge reads zero before opening it. USDA Complete Guide to Home
 * Canning, 2015 revision; the 1994 text said 2 minutes. Jarday follows 2015.
 */
export const PRESSURE_WAIT_AFTER_ZERO_MINUTES = 10;
/** Water above the jar tops in a boiling-water canner, inches (USDA Guide 1). */
export const WATER_OVER_JARS_INCHES = 1;
/** Canner water heated before jars go in, °F: 140 for raw pack, 180 for hot pack (USDA Guide 1). */
export const PREHEAT_WATER_F: Record<PackStyle, number> = { raw: 140, hot: 180 };

/**
 * How the process is timed, and what happens if the boil or the pressure is lost. Timing starts at a full rolling
 * boil, or when the gauge reaches the pressure (USDA Guide 1, confirmed). If the boil or the pressure is lost, the
 * full time starts again (USDA Guide 1, 2015; from memory). Some sources say to pause instead; Jarday does not.
 */
export interface Timing {
  startsWhen: 'rolling-boil' | 'at-pressure';
  /** Always the full time again: Jarday never pauses and resumes a process timer. */
  ifLost: 'restart-full-time';
  text: string;
}

export type AfterProcess =
  | { method: 'boiling-water'; restMinutes: number; text: string }
  | { method: 'pressure'; coolDown: 'natural'; waitAfterZeroMinutes: number; text: string };

export function boilingWaterTiming(minutes: number): Timing {
  return {
    startsWhen: 'rolling-boil',
    ifLost: 'restart-full-time',
    text:
      `Start the ${minutes} minutes only when the water is at a full rolling boil, and keep it boiling. If the ` +
      'boil stops, bring it back to a rolling boil and time the full process again from the start.',
  };
}

export function pressureTiming(minutes: number, pounds: number, gaugeIsDial: boolean): Timing {
  const reading = gaugeIsDial ? `the dial reads ${pounds} lb` : `the ${pounds} lb weight rocks`;
  return {
    startsWhen: 'at-pressure',
    ifLost: 'restart-full-time',
    text:
      `Start the ${minutes} minutes when ${reading}. If the pressure falls below ${pounds} lb, bring it back ` +
      'up and time the full process again from the start.',
  };
}

export function boilingWaterAfter(): AfterProcess {
  return {
    method: 'boiling-water',
    restMinutes: BOILING_WATER_REST_MINUTES,
    text:
      `Turn off the heat and take off the canner lid. Let the jars stand ${BOILING_WATER_REST_MINUTES} minutes, ` +
      'then lift them straight up and out, keeping them upright.',
  };
}

export function pressureAfter(): AfterProcess {
  return {
    method: 'pressure',
    coolDown: 'natural',
    waitAfterZeroMinutes: PRESSURE_WAIT_AFTER_ZERO_MINUTES,
    text:
      'Turn off the heat and let the pressure fall to zero by itself; never cool the canner to hurry it. ' +
      `Wait ${PRESSURE_WAIT_AFTER_ZERO_MINUTES} more minutes, then open the lid, tilted away from you.`,
  };
}
