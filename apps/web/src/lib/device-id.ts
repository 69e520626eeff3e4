const DEVICE_KEY = 'jarday-device-id';
let fallbackId: string | undefined;

/**
 * The device id the journal names: random, kept in local storage so the same tablet is the same device all day
 * (and the next). Falls back to a per-tab id where storage is blocked.
 */
export function liveDeviceId(): string {
  try {
    const kept = window.localStorage.getItem(DEVICE_KEY);
    if (kept && /^[A-Za-z0-9_-]{8,64}$/.test(kept)) return kept;
    const made = crypto.randomUUID();
    window.localStorage.setItem(DEVICE_KEY, made);
    return made;
  } catch {
    return (fallbackId ??= crypto.randomUUID());
  }
}
