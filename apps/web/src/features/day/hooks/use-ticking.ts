import { createTicker } from '../../../lib/ticker';

/** Ten looks a second: the digits turn within a tenth of a second of the true boundary on every device. */
export const useTicking = createTicker(100);
