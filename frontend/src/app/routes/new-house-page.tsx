import { Breadcrumbs, Link, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useCallback, useMemo, useState } from 'react';
import { Link as RouterLink, useNavigate, useParams } from 'react-router-dom';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { paths } from '../../config/paths';
import { farmAllows, farmDetailQueryOptions } from '../../features/farms';
import { HouseForm, newHouseDefaults, useCreateHouse } from '../../features/houses';
import { referenceDataQueryOptions } from '../../lib/reference-data';
import { PageTitle } from '../../components/page-title';
import { UnsavedChangesGuard } from '../../components/unsaved-changes-guard';

export default function NewHousePage() {
  const farmId = Number(useParams().farmId);
  const farm = useQuery(farmDetailQueryOptions(farmId));
  const referenceData = useQuery(referenceDataQueryOptions());
  const createHouse = useCreateHouse(farmId);
  const navigate = useNavigate();
  const defaults = useMemo(
    () => (referenceData.data ? newHouseDefaults(referenceData.data) : undefined),
    [referenceData.data],
  );
  // Anything typed asks before it is left behind; once the house is being created (and after it
  // is, while the page moves on to it) there is nothing to lose.
  const [edited, setEdited] = useState(false);
  const onValuesChange = useCallback((_input: unknown, { dirty }: { dirty: boolean }) => setEdited(dirty), []);

  if (farm.isPending || referenceData.isPending) return <LoadingState />;
  if (farm.isError) return <ErrorAlert error={farm.error} title="Farm could not be loaded" />;
  if (referenceData.isError)
    return <ErrorAlert error={referenceData.error} title="Reference tables could not be loaded" />;
  if (!farmAllows(farm.data, 'house:write')) {
    return <ErrorAlert error={new Error('Your role on this farm does not allow adding houses.')} />;
  }

  return (
    <Stack spacing={2} sx={{ maxWidth: 900 }}>
      <PageTitle title={`New house – ${farm.data.name}`} />
      <Breadcrumbs aria-label="Breadcrumb">
        <Link component={RouterLink} to={paths.farms}>
          Farms
        </Link>
        <Link component={RouterLink} to={paths.farm(farmId)}>
          {farm.data.name}
        </Link>
        <Typography color="text.primary">New house</Typography>
      </Breadcrumbs>
      <Typography variant="h1">New house</Typography>
      <UnsavedChangesGuard
        dirty={edited && !createHouse.isPending && !createHouse.isSuccess}
        what="the new house"
        offerAlternative={false}
      />
      {defaults ? (
        <HouseForm
          house={defaults}
          referenceData={referenceData.data}
          submitLabel="Create house"
          onValuesChange={onValuesChange}
          onSubmit={async (input) => {
            const house = await createHouse.mutateAsync(input);
            navigate(paths.house(house.id), { replace: true });
          }}
        />
      ) : null}
    </Stack>
  );
}
