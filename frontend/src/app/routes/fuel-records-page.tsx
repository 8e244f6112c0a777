import { Alert, Breadcrumbs, Button, Link, Paper, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { PageTitle } from '../../components/page-title';
import { paths } from '../../config/paths';
import {
  CalibrationResults,
  calibrationsQueryOptions,
  fuelOptions,
  FuelRecordsGrid,
  fuelRecordsQueryOptions,
  FuelRecordsUpload,
  useRunCalibration,
} from '../../features/calibration';
import { farmAllows, farmDetailQueryOptions } from '../../features/farms';
import { farmHousesQueryOptions } from '../../features/houses';
import { referenceDataQueryOptions } from '../../lib/reference-data';

/** A farm's fuel bills, and the calibration of each house's heat loss against them. */
export default function FuelRecordsPage() {
  const farmId = Number(useParams().farmId);
  const farm = useQuery(farmDetailQueryOptions(farmId));
  const houses = useQuery(farmHousesQueryOptions(farmId));
  const records = useQuery(fuelRecordsQueryOptions(farmId));
  const calibrations = useQuery(calibrationsQueryOptions(farmId));
  const referenceData = useQuery(referenceDataQueryOptions());
  const run = useRunCalibration(farmId);

  if (farm.isError) return <ErrorAlert error={farm.error} title="Farm could not be loaded" />;
  if (!farm.data) return <LoadingState label="Loading farm…" />;
  const canEdit = farmAllows(farm.data, 'house:write');
  const fuels = fuelOptions(referenceData.data);
  const houseList = (houses.data ?? []).map((house) => ({ id: house.id, name: house.name }));
  const newest = calibrations.data?.[0];

  return (
    <Stack spacing={3}>
      <PageTitle title={`Fuel bills and calibration: ${farm.data.name}`} />
      <Breadcrumbs aria-label="Breadcrumb">
        <Link component={RouterLink} to={paths.farms}>
          Farms
        </Link>
        <Link component={RouterLink} to={paths.farm(farmId)}>
          {farm.data.name}
        </Link>
        <Typography color="text.primary">Fuel bills</Typography>
      </Breadcrumbs>
      <Typography variant="h1">Fuel bills and calibration</Typography>
      <Typography color="text.secondary">
        Enter what the farm bought last winter: each bill or tank delivery with the days it covers (for a delivery, from
        the day after the previous fill) and the houses its meter or tank serves. The calibration runs the hourly model
        over each period and finds, for each meter, the factor on the houses&apos; heat loss that best matches the
        bills. Budgets can then be shown “as calibrated”.
      </Typography>

      <Paper component="section" aria-labelledby="fuel-bills-heading" sx={{ p: 2 }}>
        <Stack spacing={2}>
          <Typography id="fuel-bills-heading" variant="h2">
            Bills and deliveries
          </Typography>
          <ErrorAlert error={records.error} title="The bills could not be loaded" />
          <ErrorAlert error={referenceData.error} title="Reference tables could not be loaded" />
          <FuelRecordsGrid
            farmId={farmId}
            records={records.data ?? []}
            loading={records.isPending || houses.isPending}
            fuels={fuels}
            houses={houseList}
            canEdit={canEdit}
            currency={farm.data.currency}
          />
          {canEdit ? <FuelRecordsUpload farmId={farmId} fuels={fuels} houses={houseList} /> : null}
        </Stack>
      </Paper>

      <Paper component="section" aria-labelledby="calibration-heading" sx={{ p: 2 }}>
        <Stack spacing={2}>
          <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
            <Typography id="calibration-heading" variant="h2" sx={{ flexGrow: 1 }}>
              Calibration
            </Typography>
            {canEdit ? (
              <Button
                variant="contained"
                onClick={() => run.mutate()}
                disabled={run.isPending || (records.data?.length ?? 0) === 0}
              >
                {newest ? 'Run the calibration again' : 'Run calibration'}
              </Button>
            ) : null}
          </Stack>
          {run.isPending ? <LoadingState label="Fitting the houses to the bills…" /> : null}
          <ErrorAlert error={run.error} title="No calibration" />
          <ErrorAlert error={calibrations.error} title="Calibrations could not be loaded" />
          {newest ? (
            <CalibrationResults calibration={newest} />
          ) : (
            <Alert severity="info">
              No calibration yet. It needs at least three bills with heating in them for each meter or tank.
            </Alert>
          )}
          <Typography variant="body2">
            See the{' '}
            <Link component={RouterLink} to={`${paths.farm(farmId)}?tab=season&basis=calibrated`}>
              season budget as calibrated
            </Link>
            .
          </Typography>
        </Stack>
      </Paper>
    </Stack>
  );
}
