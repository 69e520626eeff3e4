import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';

/**
 * Boiling point falls with altitude, so tested recipes give longer times (boiling water) or higher
 * pressures (pressure canner) above 1,000 ft (USDA Complete Guide to Home Canning, Guide 1).
 */
export function AltitudeCaution() {
  return (
    <Alert severity="warning" role="note">
      <AlertTitle>Altitude changes process times</AlertTitle>
      Water boils at a lower temperature the higher you are, so tested recipes give longer times or higher pressures
      above 1,000 ft. Enter the kitchen&apos;s real altitude and use tested recipes. If you are unsure, ask your local
      extension service; for food that is sold, follow local codes and licensed practice.
    </Alert>
  );
}
