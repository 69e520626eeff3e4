import type { RecipeData } from '@jarday/contracts';
import { bandLabel, findBand, formatFeet, altitudeInFeet, gaugePressure, type Altitude } from '@jarday/rules';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { rowLabel } from '../utils/recipe-labels';

type Processing = RecipeData['processing'];

// MUI puts table captions below the table; a caption that names the table reads better above it.
const tableSx = {
  '& caption': { captionSide: 'top', p: 0, pb: 1, color: 'text.primary', fontSize: '1.125rem', fontWeight: 500 },
} as const;
const highlight = { bgcolor: 'action.selected', fontWeight: 700 } as const;
// Band and minute cells never wrap; on a phone the table scrolls sideways instead of squeezing its numbers.
const cell = { whiteSpace: 'nowrap' } as const;

/** The boiling-water table as it is printed: a column per altitude band, the kitchen's own band marked. */
function BoilingWaterTable({
  table,
  altitude,
}: {
  table: NonNullable<Processing['boilingWater']>;
  altitude: Altitude;
}) {
  const band = findBand(table.bands, altitude);
  const mine = (i: number) => band?.index === i;
  return (
    <Stack spacing={1}>
      <TableContainer sx={{ overflowX: 'auto' }}>
        <Table size="small" sx={tableSx}>
          <Typography component="caption">Boiling-water canner: minutes by altitude</Typography>
          <TableHead>
            <TableRow>
              <TableCell component="th" scope="col" sx={{ minWidth: 140 }}>
                Jar size and pack
              </TableCell>
              {table.bands.map((_, i) => (
                <TableCell
                  key={i}
                  component="th"
                  scope="col"
                  align="right"
                  aria-current={mine(i) ? 'true' : undefined}
                  sx={mine(i) ? { ...cell, ...highlight } : cell}
                >
                  <Stack spacing={0.5} sx={{ alignItems: 'flex-end' }}>
                    <span>{bandLabel(table.bands, i)}</span>
                    {mine(i) ? <Chip size="small" color="primary" label="Your kitchen" /> : null}
                  </Stack>
                </TableCell>
              ))}
            </TableRow>
          </TableHead>
          <TableBody>
            {table.rows.map((row) => (
              <TableRow key={`${row.jarSize}/${row.pack}`}>
                <TableCell component="th" scope="row">
                  {rowLabel(row)}
                </TableCell>
                {row.minutes.map((minutes, i) => (
                  <TableCell
                    key={i}
                    align="right"
                    aria-current={mine(i) ? 'true' : undefined}
                    sx={mine(i) ? { ...cell, ...highlight } : cell}
                  >
                    {minutes} min
                  </TableCell>
                ))}
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
      {band !== null ? (
        // On a phone the table scrolls sideways; the kitchen's own times are repeated here so they need no scrolling.
        <Typography variant="body2" sx={{ display: { sm: 'none' } }}>
          At your kitchen ({band.label}):{' '}
          {table.rows.map((row) => `${rowLabel(row).toLowerCase()} ${row.minutes[band.index]} min`).join('; ')}.
        </Typography>
      ) : null}
      {band === null ? (
        <Typography sx={{ color: 'error.main' }}>
          Your kitchen, at {formatFeet(altitudeInFeet(altitude))} ft, is above this table: it has no tested time there.
        </Typography>
      ) : null}
    </Stack>
  );
}

/** Pressure minutes per jar and pack, with the gauge pressures that hold at the kitchen (USDA Guide 1; PNW 421). */
function PressureTable({ table, altitude }: { table: NonNullable<Processing['pressure']>; altitude: Altitude }) {
  const weighted = gaugePressure('weighted', altitude);
  const dial = gaugePressure('dial', altitude);
  return (
    <Stack spacing={1}>
      <TableContainer>
        <Table size="small" sx={tableSx}>
          <Typography component="caption">Pressure canner: minutes at the gauge pressure for your altitude</Typography>
          <TableHead>
            <TableRow>
              <TableCell component="th" scope="col">
                Jar size and pack
              </TableCell>
              <TableCell component="th" scope="col" align="right">
                Minutes
              </TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {table.rows.map((row) => (
              <TableRow key={`${row.jarSize}/${row.pack}`}>
                <TableCell component="th" scope="row">
                  {rowLabel(row)}
                </TableCell>
                <TableCell align="right">{row.minutes} min</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
      <Typography>
        {weighted.ok && dial.ok
          ? `At your altitude: ${weighted.pounds} lb on a weighted gauge (${weighted.band.label} band), ` +
            `${dial.pounds} lb on a dial gauge (${dial.band.label} band).`
          : 'The pressure tables stop at 10,000 ft: there is no tested pressure for your altitude. Ask your local extension service.'}
      </Typography>
    </Stack>
  );
}

/** A recipe's process tables, read-only. */
export function ProcessTableView({ processing, altitude }: { processing: Processing; altitude: Altitude }) {
  return (
    <Stack spacing={3}>
      {processing.boilingWater ? <BoilingWaterTable table={processing.boilingWater} altitude={altitude} /> : null}
      {processing.pressure ? <PressureTable table={processing.pressure} altitude={altitude} /> : null}
    </Stack>
  );
}
