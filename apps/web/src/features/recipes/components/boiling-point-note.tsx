import { boilingPoint, formatFeet, altitudeInFeet, type Altitude, type UnitSystem } from '@jarday/rules';
import Typography from '@mui/material/Typography';

/**
 * Where water boils at the kitchen on a standard day (ICAO standard atmosphere, IAPWS-IF97), and why that
 * lengthens process times.
 */
export function BoilingPointNote({ altitude, units }: { altitude: Altitude; units: UnitSystem }) {
  const point = boilingPoint(altitude);
  const f = `${point.fahrenheit.toFixed(1)} °F`;
  const c = `${point.celsius.toFixed(1)} °C`;
  const where =
    altitude.unit === 'm'
      ? `${Math.round(altitude.value)} m (${formatFeet(altitudeInFeet(altitude))} ft)`
      : `${formatFeet(altitude.value)} ft`;
  return (
    <Typography>
      At {where}, water boils at about <strong>{units === 'us' ? `${f} (${c})` : `${c} (${f})`}</strong> on a standard
      day. Cooler boiling water heats the food in the jars more slowly, so tested recipes give longer times, or higher
      pressures, the higher the kitchen.
    </Typography>
  );
}
