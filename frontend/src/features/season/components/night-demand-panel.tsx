import { Alert, Paper, Stack, TextField, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { SeasonRequest } from '../../../api/types';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import { useUnits, type FuelUnits } from '../../../lib/units';
import { nightDemandQueryOptions } from '../queries';
import { Fact, FuelCautions } from './fuel-cautions';

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;
const readableTime = (localTime: string | null) => (localTime ? localTime.replace('T', ' ') : 'none');

/** Heat, fuel and cost of one night, sunset to sunrise, for a date the user picks. */
export function NightDemandPanel({
  houseId,
  initialDate,
  climateSource,
  fuelUnitsFor,
}: {
  houseId: number;
  initialDate: string;
  climateSource: SeasonRequest['climateSource'];
  /** purchase units of a fuel id (the night result names its fuel by id only) */
  fuelUnitsFor: (fuelId: string) => FuelUnits | null;
}) {
  const units = useUnits();
  const [date, setDate] = useState(initialDate);
  const valid = ISO_DATE.test(date);
  const night = useQuery({ ...nightDemandQueryOptions(houseId, { date, climateSource }), enabled: valid });
  const result = night.data;

  return (
    <Paper component="section" aria-labelledby="night-demand-heading" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Typography id="night-demand-heading" variant="h3" component="h2">
          One night&apos;s heat
        </Typography>
        <TextField
          type="date"
          label="Night beginning on"
          value={date}
          onChange={(event) => setDate(event.target.value)}
          sx={{ maxWidth: 220 }}
          slotProps={{ inputLabel: { shrink: true } }}
          error={!valid}
          helperText={valid ? 'The evening the night begins' : 'Choose a date'}
        />
        {night.isFetching && !result ? <LoadingState label="Computing the night…" /> : null}
        <ErrorAlert error={night.error} title="The night could not be computed" />
        {result ? (
          <>
            <Stack direction="row" spacing={3} useFlexGap sx={{ flexWrap: 'wrap' }}>
              <Fact label="Sunset" value={readableTime(result.sunset)} />
              <Fact label="Sunrise" value={readableTime(result.sunrise)} />
              <Fact
                label="Night length"
                value={units.format('durationHours', result.nightHours)}
                testId="night-length"
              />
              <Fact label="Heat" value={units.format('energyKWh', result.energyKWh)} />
              <Fact label="Fuel" value={units.fuel(result, fuelUnitsFor(result.inputsUsed.fuelId))} />
              <Fact label="Cost" value={units.money(result.cost, result.inputsUsed.currency)} />
            </Stack>
            <Typography variant="body2" color="text.secondary">
              Held at {units.format('temperature', result.nightSetpointC)}; the coldest hour is{' '}
              {units.format('temperature', result.minOutdoorC)} and needs {units.format('power', result.peakW)}. Of the
              heat, {units.format('energyKWh', result.skyKWh)} is radiated to the night sky. Times are local standard
              time.
            </Typography>
            {result.capacityCaution ? <Alert severity="warning">{units.prose(result.capacityCaution)}</Alert> : null}
            <FuelCautions cautions={result.cautions} />
          </>
        ) : null}
      </Stack>
    </Paper>
  );
}
