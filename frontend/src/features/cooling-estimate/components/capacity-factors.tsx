import { Table, TableBody, TableCell, TableRow } from '@mui/material';
import type { CoolingEstimate } from '../../../api/types';
import { formatFixed } from '../cooling-display';

/** The factors the base rate is multiplied by, and which one is applied. */
export function CapacityFactors({ estimate }: { estimate: CoolingEstimate }) {
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
  );
}
