import { METRES_PER_FOOT, type Altitude } from '@jarday/rules';

const whole = new Intl.NumberFormat(undefined, { maximumFractionDigits: 0 });

/** "1,200 m (3,937 ft)": metric altitudes also show feet, since tested process tables are banded in feet. */
export function formatAltitude(altitude: Altitude): string {
  if (altitude.unit === 'ft') return `${whole.format(altitude.value)} ft`;
  return `${whole.format(altitude.value)} m (${whole.format(altitude.value / METRES_PER_FOOT)} ft)`;
}
