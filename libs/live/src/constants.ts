/** Durations are in milliseconds throughout the live core, as are server times (epoch ms). */
export const SECOND_MS = 1_000;
export const MINUTE_MS = 60 * SECOND_MS;
export const HOUR_MS = 60 * MINUTE_MS;

/**
 * Tomatoes are peeled after a dip in boiling water of 30 to 60 seconds, or until the skins split (USDA Complete
 * Guide to Home Canning, Guide 3). A suggestion for the board, not a gate: the skins are the real signal.
 */
export const BLANCH_DIP_MS = { min: 30 * SECOND_MS, max: 60 * SECOND_MS } as const;

/** Vent (exhaust steam from) a pressure canner for 10 minutes before closing the vent (USDA Guide 1). */
export const PRESSURE_VENT_MS = 10 * MINUTE_MS;

/**
 * Wait after the gauge reads zero before opening the pressure canner: 10 minutes in the 2015 revision of the USDA
 * Guide. The 1994 text said 2 minutes; Jarday follows 2015, the newer guidance.
 */
export const PRESSURE_OPENING_WAIT_MS = 10 * MINUTE_MS;
/** The 1994 figure, kept only so the difference is documented and tested. */
export const PRESSURE_OPENING_WAIT_1994_MS = 2 * MINUTE_MS;

/**
 * After boiling-water processing: heat off, lid off, wait 5 minutes before lifting the jars out (extension guidance
 * citing Penn State Extension). The shortest canner-rest timer a helper may set.
 */
export const CANNER_REST_MS = 5 * MINUTE_MS;

/**
 * Jars cool undisturbed 12 to 24 hours before the bands come off and seals are checked (USDA Guide 1). The shortest
 * cooling-rest timer a helper may set; shorter needs a lead's override.
 */
export const COOLING_REST_MS = 12 * HOUR_MS;

/** Bounds for any timer's duration and any added time: at least a second, at most two days. */
export const MIN_DURATION_MS = SECOND_MS;
export const MAX_DURATION_MS = 48 * HOUR_MS;

export const MAX_LABEL_LENGTH = 80;
export const MAX_REASON_LENGTH = 500;

/** Largest epoch-ms value a JavaScript Date accepts (ECMA-262 time values). */
export const MAX_EPOCH_MS = 8.64e15;
