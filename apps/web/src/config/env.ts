/** Every REST call goes through the same origin; Vite proxies /api to the server in development. */
export const API_BASE = '/api';

/** Renew the access token this long before the server says it stops working. */
export const RENEW_BEFORE_EXPIRY_MS = 60_000;

/** Never schedule a renewal sooner than this, so a skewed clock cannot cause a tight loop. */
export const MIN_RENEW_DELAY_MS = 5_000;

/** localStorage key under which MUI keeps the chosen light/dark scheme. */
export const COLOR_MODE_STORAGE_KEY = 'jarday-color-mode';
