import AddIcon from '@mui/icons-material/Add';
import { Breadcrumbs, Button, Link, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link as RouterLink, useNavigate, useParams } from 'react-router-dom';
import { ConfirmDialog } from '../../components/confirm-dialog';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { paths } from '../../config/paths';
import { farmAllows, farmDetailQueryOptions, FarmFormDialog, FarmSummary, useDeleteFarm } from '../../features/farms';
import { farmHousesQueryOptions, HousesTable } from '../../features/houses';

export default function FarmPage() {
  const farmId = Number(useParams().farmId);
  const farm = useQuery(farmDetailQueryOptions(farmId));
  const houses = useQuery(farmHousesQueryOptions(farmId));
  const deleteFarm = useDeleteFarm();
  const navigate = useNavigate();
  const [editing, setEditing] = useState(false);
  const [confirmingDelete, setConfirmingDelete] = useState(false);

  if (farm.isPending) return <LoadingState label="Loading farm…" />;
  if (farm.isError) return <ErrorAlert error={farm.error} title="Farm could not be loaded" />;

  return (
    <Stack spacing={3}>
      <Breadcrumbs aria-label="Breadcrumb">
        <Link component={RouterLink} to={paths.farms}>
          Farms
        </Link>
        <Typography color="text.primary">{farm.data.name}</Typography>
      </Breadcrumbs>
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Typography variant="h1" sx={{ flexGrow: 1 }}>
          {farm.data.name}
        </Typography>
        {farmAllows(farm.data, 'farm:update') ? (
          <Button variant="outlined" onClick={() => setEditing(true)}>
            Edit farm
          </Button>
        ) : null}
        {farmAllows(farm.data, 'farm:delete') ? (
          <Button color="error" onClick={() => setConfirmingDelete(true)}>
            Delete farm
          </Button>
        ) : null}
      </Stack>
      <FarmSummary farm={farm.data} />
      <ErrorAlert error={deleteFarm.error} />

      <Stack component="section" aria-labelledby="houses-heading" spacing={2}>
        <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between' }}>
          <Typography id="houses-heading" variant="h2">
            Houses
          </Typography>
          {farmAllows(farm.data, 'house:write') ? (
            <Button
              variant="contained"
              startIcon={<AddIcon />}
              component={RouterLink}
              to={paths.newHouse(farmId)}
            >
              New house
            </Button>
          ) : null}
        </Stack>
        <ErrorAlert error={houses.error} title="Houses could not be loaded" />
        <HousesTable houses={houses.data ?? []} loading={houses.isPending} />
      </Stack>

      <FarmFormDialog open={editing} onClose={() => setEditing(false)} farm={farm.data} />
      <ConfirmDialog
        open={confirmingDelete}
        title={`Delete ${farm.data.name}?`}
        message="The farm, its houses and their saved results are removed for every member. This cannot be undone."
        confirmLabel="Delete farm"
        busy={deleteFarm.isPending}
        onClose={() => setConfirmingDelete(false)}
        onConfirm={() =>
          deleteFarm.mutate(farmId, {
            onSuccess: () => navigate(paths.farms, { replace: true }),
            onSettled: () => setConfirmingDelete(false),
          })
        }
      />
    </Stack>
  );
}
