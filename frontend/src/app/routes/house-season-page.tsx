import { Breadcrumbs, Link, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useParams, useSearchParams } from 'react-router-dom';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { paths } from '../../config/paths';
import { houseAlternativesQueryOptions } from '../../features/alternatives';
import { farmAllows, farmDetailQueryOptions } from '../../features/farms';
import { houseDetailQueryOptions } from '../../features/houses';
import { MissingPriceForm } from '../../features/fuel-prices';
import { SeasonView } from '../../features/season';
import { CalibrationBasisSwitch, useHeatLossBasisParam } from '../../features/calibration';
import { farmTemperatureLogsQueryOptions } from '../../features/temperature-logs';
import { PageTitle } from '../../components/page-title';

/** A house's heating season: night demand, hourly season with the degree-day check, calendar, measures. */
export default function HouseSeasonPage() {
  const houseId = Number(useParams().houseId);
  const house = useQuery(houseDetailQueryOptions(houseId));
  const farmId = house.data?.farmId ?? 0;
  const farm = useQuery({ ...farmDetailQueryOptions(farmId), enabled: house.isSuccess });
  const logs = useQuery({ ...farmTemperatureLogsQueryOptions(farmId), enabled: house.isSuccess });
  const alternatives = useQuery(houseAlternativesQueryOptions(houseId));
  const [search, setSearch] = useSearchParams();
  const [heatLossBasis, setHeatLossBasis] = useHeatLossBasisParam();
  const alternativeId = Number(search.get('alternative')) || null;
  const alternative = alternatives.data?.find((alt) => alt.id === alternativeId) ?? null;
  const valid = (alternatives.data ?? []).filter((alt) => !alt.invalid);

  if (house.isError) return <ErrorAlert error={house.error} title="House could not be loaded" />;
  if (farm.isError) return <ErrorAlert error={farm.error} title="Farm could not be loaded" />;
  if (!house.data || !farm.data) return <LoadingState label="Loading house…" />;

  return (
    <Stack spacing={2}>
      <PageTitle title={`Heating season: ${house.data.name}`} />
      <Breadcrumbs aria-label="Breadcrumb">
        <Link component={RouterLink} to={paths.farms}>
          Farms
        </Link>
        <Link component={RouterLink} to={paths.farm(farm.data.id)}>
          {farm.data.name}
        </Link>
        <Link component={RouterLink} to={paths.house(house.data.id)}>
          {house.data.name}
        </Link>
        <Typography color="text.primary">Season</Typography>
      </Breadcrumbs>
      <Typography variant="h1">
        Heating season: {house.data.name}
        {alternative ? ` — alternative “${alternative.name}”` : ''}
      </Typography>
      {valid.length > 0 ? (
        <TextField
          select
          label="Run for"
          value={alternative ? String(alternative.id) : 'house'}
          onChange={(event) =>
            setSearch(event.target.value === 'house' ? {} : { alternative: event.target.value }, { replace: true })
          }
          sx={{ maxWidth: 380 }}
        >
          <MenuItem value="house">The house as it is</MenuItem>
          {valid.map((alt) => (
            <MenuItem key={alt.id} value={String(alt.id)}>
              Alternative: {alt.name}
            </MenuItem>
          ))}
        </TextField>
      ) : null}
      <CalibrationBasisSwitch farmId={farm.data.id} value={heatLossBasis} onChange={setHeatLossBasis} />
      <SeasonView
        key={alternative?.id ?? 'house'}
        heatLossBasis={heatLossBasis}
        alternative={
          alternative
            ? { id: alternative.id, name: alternative.name, ownCalendar: alternative.calendar !== null }
            : null
        }
        houseId={houseId}
        canRun={farmAllows(farm.data, 'estimate:run')}
        canEditCalendar={farmAllows(farm.data, 'house:write')}
        logs={logs.data ?? []}
        renderMissingPrice={(fuel) => (
          <MissingPriceForm
            farmId={farm.data.id}
            fuel={fuel}
            currency={farm.data.currency}
            canEdit={farmAllows(farm.data, 'house:write')}
          />
        )}
      />
    </Stack>
  );
}
