import { createTicker } from '../../../lib/ticker';

/** The shelf counts in minutes; a look each second turns the text within a second of the true boundary. */
export const useEverySecond = createTicker(1000);
