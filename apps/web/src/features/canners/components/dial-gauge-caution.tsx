import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';

/** A dial gauge that reads wrong under-processes every load; PNW 421 advises checking it each year. */
export function DialGaugeCaution() {
  return (
    <Alert severity="warning" role="note">
      <AlertTitle>Check the dial gauge every year</AlertTitle>A dial gauge can drift and read high or low. Have it
      checked for accuracy every year, and replace it if it is off; your local extension service can tell you where.
      Weighted gauges do not need this check.
    </Alert>
  );
}
