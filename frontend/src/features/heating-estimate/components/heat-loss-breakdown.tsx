import { Box, Stack, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import type { HeatingEstimate } from '../../../api/types';
import type { Units } from '../../../lib/units';
import { heatLossRows } from '../heating-chart-data';
import { NO_WRAP } from '../heating-display';
import { HeatLossChart } from './heat-loss-chart';

/** Where the heat goes: each part of the house with its size, coefficient, loss and share, then the chart. */
export function HeatLossBreakdown({ estimate, units }: { estimate: HeatingEstimate; units: Units }) {
  const rows = heatLossRows(estimate.heatLoss.components, units);
  return (
    <Stack spacing={1.5}>
      <Box sx={{ overflowX: 'auto' }}>
        <Table size="small" aria-label="Heat loss by part">
          <TableHead>
            <TableRow>
              <TableCell>Part</TableCell>
              <TableCell align="right">Size</TableCell>
              <TableCell align="right">U / F / ACH</TableCell>
              <TableCell align="right">Loss</TableCell>
              <TableCell align="right">Share</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {rows.map((row) => (
              <TableRow key={row.key}>
                <TableCell>
                  {row.label}
                  {row.detail ? (
                    <Typography variant="caption" color="text.secondary" component="div">
                      {row.detail}
                    </Typography>
                  ) : null}
                </TableCell>
                <TableCell align="right" sx={NO_WRAP}>
                  {row.quantity}
                </TableCell>
                <TableCell align="right">{row.coefficient}</TableCell>
                <TableCell align="right" sx={NO_WRAP}>
                  {row.loss}
                </TableCell>
                <TableCell align="right" sx={NO_WRAP}>
                  {row.share}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </Box>
      <HeatLossChart components={estimate.heatLoss.components} />
    </Stack>
  );
}
