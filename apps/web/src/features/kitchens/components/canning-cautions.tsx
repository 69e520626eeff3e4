import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';

/** The standing cautions of home canning (USDA Complete Guide to Home Canning, Guide 1). */
export function CanningCautions() {
  return (
    <Alert severity="info" role="note">
      <AlertTitle>Before a canning day</AlertTitle>
      <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
        <li>Use tested recipes and adjust them for your altitude.</li>
        <li>Low-acid foods (vegetables, meat, poultry, fish) need a pressure canner.</li>
        <li>Hot jars, boiling water and steam burn: lift jars upright with a jar lifter.</li>
        <li>Never taste food from an unsealed or suspect jar.</li>
        <li>Follow your local extension service; for food that is sold, follow local codes and licensed practice.</li>
      </Box>
    </Alert>
  );
}
