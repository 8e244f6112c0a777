import { Button, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { useState } from 'react';
import type { TemperatureLog } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import { useKeepWeatherYearAsLog } from '../mutations';

/**
 * A past year of the farm's hourly weather history kept as a log, so a season can run on that
 * year's actual hours (last winter, for example) without a file to upload.
 */
export function WeatherYearLog({ farmId, onStored }: { farmId: number; onStored: (log: TemperatureLog) => void }) {
  const lastYear = new Date().getFullYear() - 1;
  const [year, setYear] = useState(lastYear);
  const keep = useKeepWeatherYearAsLog(farmId);
  const years = Array.from({ length: 30 }, (_unused, index) => lastYear - index);
  return (
    <Stack spacing={1} component="section" aria-labelledby="weather-year-log-heading">
      <Typography id="weather-year-log-heading" variant="h3">
        A year from weather history
      </Typography>
      <Typography variant="body2" color="text.secondary">
        No logger? Keep a whole year of the hourly weather history at the farm&apos;s coordinates as a log, and run a
        season on it.
      </Typography>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
        <TextField
          select
          label="Year"
          value={year}
          onChange={(event) => setYear(Number(event.target.value))}
          sx={{ minWidth: 140 }}
        >
          {years.map((option) => (
            <MenuItem key={option} value={option}>
              {option}
            </MenuItem>
          ))}
        </TextField>
        <Button
          variant="outlined"
          disabled={keep.isPending}
          onClick={() => keep.mutate(year, { onSuccess: (log) => onStored(log) })}
        >
          {keep.isPending ? 'Reading the year…' : 'Keep this year as a log'}
        </Button>
      </Stack>
      <ErrorAlert error={keep.error} title="Nothing was stored" />
    </Stack>
  );
}
