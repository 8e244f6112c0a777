import { Alert, Grid, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useCallback, useState, type ReactNode } from 'react';
import type { SeasonRequest } from '../../../api/types';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import { referenceDataQueryOptions, referenceRows } from '../../../lib/reference-data';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useUnits, type FuelUnits } from '../../../lib/units';
import { houseSeasonQueryOptions } from '../queries';
import { nightStartDate } from '../season-chart-data';
import { CalendarEditor } from './calendar-editor';
import { FuelCautions } from './fuel-cautions';
import { MeasuresPanel } from './measures-panel';
import { NightDemandPanel } from './night-demand-panel';
import { DegreeDayPanel, SeasonResultPanel } from './season-result-panel';

/** A stored temperature log the user may run the season on instead of the normals. */
export interface ClimateLogOption {
  id: number;
  name: string;
  startDate: string;
  endDate: string;
}

export interface SeasonViewProps {
  houseId: number;
  /** estimate:run */
  canRun: boolean;
  /** house:write */
  canEditCalendar: boolean;
  logs: ClimateLogOption[];
  /** run the season and the measures for one of the house's alternatives instead of the house */
  alternative?: { id: number; name: string; ownCalendar: boolean } | null;
  /** 'calibrated': heat loss × the house's factor from the farm's fuel bills */
  heatLossBasis?: SeasonRequest['heatLossBasis'];
  /** asks for the farm's price of a fuel it has none for (the page supplies the form) */
  renderMissingPrice?: (fuel: { fuelId: string; label: string; unitSi: string; unitUs: string }) => ReactNode;
}

/** The house's heating season: one night, the hourly season beside the degree-day check, the calendar, measures. */
export function SeasonView({
  houseId,
  canRun,
  canEditCalendar,
  logs,
  alternative = null,
  heatLossBasis,
  renderMissingPrice,
}: SeasonViewProps) {
  const [climateChoice, setClimateChoice] = useState('normals');
  const climateSource: SeasonRequest['climateSource'] =
    climateChoice === 'normals' ? 'normals' : { temperatureLogId: Number(climateChoice) };
  // A fuel-price what-if is this page's own scenario: sent with each run, never saved to the farm.
  const [priceWhatIf, setPriceWhatIf] = useState('');
  const settledPrice = useDebouncedValue(priceWhatIf, 500);
  const whatIfPrice = settledPrice.trim() === '' ? null : Number(settledPrice);
  const whatIfValid = whatIfPrice === null || (Number.isFinite(whatIfPrice) && whatIfPrice >= 0 && whatIfPrice <= 1e6);
  const units = useUnits();
  const priceFields: Pick<SeasonRequest, 'pricePerUnit' | 'priceUnit'> =
    whatIfPrice !== null && whatIfValid ? { pricePerUnit: whatIfPrice, priceUnit: units.system } : {};
  const request: SeasonRequest = {
    climateSource,
    ...priceFields,
    ...(alternative ? { alternativeId: alternative.id } : {}),
    ...(heatLossBasis === 'calibrated' ? { heatLossBasis } : {}),
  };
  const season = useQuery({ ...houseSeasonQueryOptions(houseId, request), enabled: canRun });
  const referenceData = useQuery(referenceDataQueryOptions());
  const fuelUnitsFor = useCallback(
    (fuelId: string): FuelUnits | null => {
      const row = referenceRows(referenceData.data, 'fuels').find((fuel) => fuel.id === fuelId);
      return row && typeof row.unitSi === 'string' && typeof row.unitUs === 'string'
        ? { unitSi: row.unitSi, unitUs: row.unitUs }
        : null;
    },
    [referenceData.data],
  );

  if (!canRun) {
    return (
      <Stack spacing={3}>
        <Alert severity="info">Your role on this farm does not run estimates; ask a grower or the owner.</Alert>
        <CalendarEditor houseId={houseId} canEdit={canEditCalendar} />
      </Stack>
    );
  }

  // The night shown first: the one holding the season's peak hour, else mid-January.
  const peakDate = season.data?.peak ? nightStartDate(season.data.peak.at) : undefined;
  const nightDate = peakDate ?? `${season.data?.period.endDate.slice(0, 4) ?? '2027'}-01-15`;

  return (
    <Stack spacing={3}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
        <TextField
          select
          label="Outdoor temperatures from"
          value={climateChoice}
          onChange={(event) => setClimateChoice(event.target.value)}
          sx={{ maxWidth: 380 }}
        >
          <MenuItem value="normals">The farm&apos;s climate normals</MenuItem>
          {logs.map((log) => (
            <MenuItem key={log.id} value={String(log.id)}>
              Log: {log.name} ({log.startDate} to {log.endDate})
            </MenuItem>
          ))}
        </TextField>
        <Typography variant="body2" color="text.secondary">
          Logged temperatures limit the season to the days the log covers.
        </Typography>
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
        <TextField
          label={`What if fuel cost (per ${season.data ? units.fuelUnit(season.data.fuel) : 'purchase unit'})`}
          value={priceWhatIf}
          onChange={(event) => setPriceWhatIf(event.target.value)}
          inputMode="decimal"
          error={!whatIfValid}
          helperText={whatIfValid ? 'Empty = the farm’s price' : 'A number from 0 up'}
          sx={{ maxWidth: 380 }}
        />
        <Typography variant="body2" color="text.secondary">
          A what-if for this page only: the farm&apos;s shared fuel prices are not changed (set them on the farm page).
        </Typography>
      </Stack>

      {season.isPending ? <LoadingState label="Computing the season hour by hour…" /> : null}
      <ErrorAlert error={season.error} title="The season could not be computed" />
      {season.data?.inputsUsed.heatLossBasisNote ? (
        <Alert severity="info">{season.data.inputsUsed.heatLossBasisNote}</Alert>
      ) : null}
      {season.data?.inputsUsed.priceFrom === 'none' ? (
        <Stack spacing={1} data-testid="season-price-missing">
          {renderMissingPrice?.(season.data.fuel) ?? (
            <Alert severity="info">
              The farm has no price for {season.data.fuel.label} yet: heat and fuel are shown, costs are not.
            </Alert>
          )}
        </Stack>
      ) : null}
      {season.data ? (
        <>
          <Grid container spacing={3} sx={{ alignItems: 'stretch' }}>
            <Grid size={{ xs: 12, lg: 7 }}>
              <SeasonResultPanel season={season.data} />
            </Grid>
            <Grid size={{ xs: 12, lg: 5 }}>
              <DegreeDayPanel season={season.data} />
            </Grid>
          </Grid>
          <FuelCautions cautions={season.data.cautions} />
          {alternative ? null : (
            <NightDemandPanel
              key={`${nightDate}-${climateChoice}`}
              houseId={houseId}
              initialDate={nightDate}
              climateSource={climateSource}
              fuelUnitsFor={fuelUnitsFor}
            />
          )}
        </>
      ) : null}
      {alternative?.ownCalendar ? (
        <Alert severity="info">
          “{alternative.name}” brings its own production calendar; the house&apos;s calendar below is not used for it.
        </Alert>
      ) : null}
      <CalendarEditor houseId={houseId} canEdit={canEditCalendar} />
      <MeasuresPanel
        key={`${climateChoice}-${alternative?.id ?? 'house'}-${priceFields.pricePerUnit ?? 'farm'}`}
        houseId={houseId}
        climateSource={climateSource}
        priceFields={priceFields}
        alternativeId={alternative?.id}
        heatLossBasis={heatLossBasis}
        canSavePlan={canEditCalendar}
      />
    </Stack>
  );
}
