import { Alert, Stack, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import type { CoolingEstimate } from '../../../api/types';
import type { Units } from '../../../lib/units';

/** The suggested thermostat stages of the fans, the gap to night heating and any staging warnings. */
export function FanStaging({ staging, units }: { staging: CoolingEstimate['staging']; units: Units }) {
  return (
    <Stack spacing={1}>
      {staging.warnings.map((warning) => (
        <Alert key={warning} severity="warning">
          {units.prose(warning)}
        </Alert>
      ))}
      <Typography variant="body2">
        Gap between night heating and the first fan stage: {units.format('temperatureDifference', staging.deadbandK)}{' '}
        (at least {units.format('temperatureDifference', staging.requiredDeadbandK)}).
      </Typography>
      <Table size="small" aria-label="Suggested fan stages">
        <TableHead>
          <TableRow>
            <TableCell>Stage</TableCell>
            <TableCell align="right">On at</TableCell>
            <TableCell align="right">Fans</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {staging.stages.map((stage) => (
            <TableRow key={stage.stage}>
              <TableCell>{stage.stage}</TableCell>
              <TableCell align="right">{units.format('temperature', stage.onAtC)}</TableCell>
              <TableCell align="right">{stage.fans}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </Stack>
  );
}
