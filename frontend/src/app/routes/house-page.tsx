import { Box, Breadcrumbs, Button, Grid, Link, Paper, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { Link as RouterLink, useNavigate, useParams } from 'react-router-dom';
import { ConfirmDialog } from '../../components/confirm-dialog';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { paths } from '../../config/paths';
import { farmAllows, farmDetailQueryOptions } from '../../features/farms';
import {
  HouseForm,
  houseDetailQueryOptions,
  houseInputOf,
  useDeleteHouse,
  useUpdateHouse,
} from '../../features/houses';
import { referenceDataQueryOptions } from '../../lib/reference-data';

/**
 * One house: its form on the left, a column of result panels on the right.
 * The right-hand <aside> is the slot where heating, cooling and season panels are added.
 */
export default function HousePage() {
  const houseId = Number(useParams().houseId);
  const house = useQuery(houseDetailQueryOptions(houseId));
  const farm = useQuery({ ...farmDetailQueryOptions(house.data?.farmId ?? 0), enabled: house.isSuccess });
  const referenceData = useQuery(referenceDataQueryOptions());
  const updateHouse = useUpdateHouse(houseId);
  const deleteHouse = useDeleteHouse();
  const navigate = useNavigate();
  const [confirmingDelete, setConfirmingDelete] = useState(false);
  const houseInput = useMemo(() => (house.data ? houseInputOf(house.data) : undefined), [house.data]);

  if (house.isError) return <ErrorAlert error={house.error} title="House could not be loaded" />;
  if (farm.isError) return <ErrorAlert error={farm.error} title="Farm could not be loaded" />;
  if (referenceData.isError) {
    return <ErrorAlert error={referenceData.error} title="Reference tables could not be loaded" />;
  }
  if (!house.data || !houseInput || !farm.data || !referenceData.data) return <LoadingState label="Loading house…" />;

  const canWrite = farmAllows(farm.data, 'house:write');

  return (
    <Stack spacing={2}>
      <Breadcrumbs aria-label="Breadcrumb">
        <Link component={RouterLink} to={paths.farms}>
          Farms
        </Link>
        <Link component={RouterLink} to={paths.farm(farm.data.id)}>
          {farm.data.name}
        </Link>
        <Typography color="text.primary">{house.data.name}</Typography>
      </Breadcrumbs>
      <Typography variant="h1">{house.data.name}</Typography>
      <Link component={RouterLink} to={paths.houseSeason(house.data.id)} sx={{ alignSelf: 'flex-start' }}>
        Heating season, fuel budget and measures →
      </Link>

      <Grid container spacing={3} sx={{ alignItems: 'flex-start' }}>
        <Grid size={{ xs: 12, lg: 7 }}>
          <HouseForm
            house={houseInput}
            referenceData={referenceData.data}
            readOnly={!canWrite}
            onSubmit={async (input) => {
              await updateHouse.mutateAsync(input);
            }}
            actions={
              canWrite ? (
                <Button color="error" onClick={() => setConfirmingDelete(true)}>
                  Delete house
                </Button>
              ) : null
            }
          />
        </Grid>

        <Grid size={{ xs: 12, lg: 5 }}>
          <Box
            component="aside"
            aria-labelledby="house-results-heading"
            sx={{ position: { lg: 'sticky' }, top: { lg: 88 } }}
          >
            <Typography id="house-results-heading" variant="h2" sx={{ mb: 2 }}>
              Results
            </Typography>
            <Stack spacing={2}>
              {/*
                RESULT PANELS SLOT — add the heating, cooling and season panels here, one per line,
                each taking the stored house (SI) and its farm, e.g.
                  <HeatingPanel house={house.data} farm={farm.data} />
                Panels come from their own features; this page is where they meet the house.
              */}
              <Paper sx={{ p: 2, borderStyle: 'dashed' }}>
                <Typography color="text.secondary">
                  Heating, cooling and season results for this house will appear here.
                </Typography>
              </Paper>
            </Stack>
          </Box>
        </Grid>
      </Grid>

      <ConfirmDialog
        open={confirmingDelete}
        title={`Delete ${house.data.name}?`}
        message="The house and its saved results are removed for every member of the farm. This cannot be undone."
        confirmLabel="Delete house"
        busy={deleteHouse.isPending}
        onClose={() => setConfirmingDelete(false)}
        onConfirm={() =>
          deleteHouse.mutate(house.data, {
            onSuccess: () => navigate(paths.farm(house.data.farmId), { replace: true }),
            onSettled: () => setConfirmingDelete(false),
          })
        }
      />
    </Stack>
  );
}
