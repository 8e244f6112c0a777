import { Table, TableBody, TableCell, TableRow, Typography } from '@mui/material';
import { monthsInWords } from '@thermbay/engine/vocabulary';
import type { CoolingEstimate } from '../../../api/types';
import type { Units } from '../../../lib/units';
import { formatFixed } from '../cooling-display';

/**
 * Where the light factor's light comes from: the design day's own sun (or the entered light) and
 * the shade cloth, so the reader sees the fan rate and the hour-by-hour day read the same sun.
 */
export function lightSentence(estimate: CoolingEstimate, units: Units): string {
  const light = estimate.interiorLight;
  const cloth = estimate.shadeCloth;
  const from =
    light.from === 'design day'
      ? "the design day's clear-sky sun through the roof, the same sun as the hour-by-hour day"
      : 'the peak light entered for the crop under the roof';
  let shade = 'no shade cloth';
  if (cloth) {
    const passes = `${formatFixed(cloth.solarTransmittance * 100, 0)} %`;
    shade = cloth.inPlaceOnDesignDate
      ? `the shade cloth (in place ${monthsInWords(cloth.months)}) letting ${passes} through`
      : `the shade cloth not in place on the design date (only ${monthsInWords(cloth.months)})`;
  }
  return `Light at the crop ${units.format('illuminance', light.lux)}: ${from}, with ${shade}.`;
}

/** The factors the base rate is multiplied by, and which one is applied. */
export function CapacityFactors({ estimate, units }: { estimate: CoolingEstimate; units: Units }) {
  const factors = estimate.capacity.factors;
  const rows: [string, number][] = [
    ['Elevation', factors.elevation],
    ['Light', factors.light],
    ['Temperature rise', factors.temperatureRise],
    ['House (elevation × light × rise)', factors.house],
    ['Inlet-to-fan distance (velocity)', factors.velocity],
    ['Applied (larger of house and distance)', factors.applied],
  ];
  return (
    <>
      <Table size="small" aria-label="Capacity factors">
        <TableBody>
          {rows.map(([label, value]) => (
            <TableRow key={label}>
              <TableCell>{label}</TableCell>
              <TableCell align="right">× {formatFixed(value, 3)}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      <Typography variant="body2" sx={{ mt: 1 }} data-testid="light-source">
        {lightSentence(estimate, units)}
      </Typography>
    </>
  );
}
