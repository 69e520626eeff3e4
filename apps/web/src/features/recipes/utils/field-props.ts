/**
 * Slot props of a native select: the label always sits above the box, since a native select shows its chosen
 * option (even an empty "choose" one) and a resting label would cover it.
 */
export const NATIVE_SELECT = { select: { native: true }, inputLabel: { shrink: true } } as const;
