import { AddIcon } from '../../components/icons';
import { Button, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { ErrorAlert } from '../../components/feedback';
import { paths } from '../../config/paths';
import { FarmFormDialog, FarmsTable, farmsListQueryOptions } from '../../features/farms';
import { ClientFarms } from '../../features/reports';
import { PageTitle } from '../../components/page-title';

export default function FarmsPage() {
  const farms = useQuery(farmsListQueryOptions());
  const [creating, setCreating] = useState(false);
  const navigate = useNavigate();
  return (
    <Stack spacing={2}>
      <PageTitle title={'Farms'} />
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between' }}>
        <Typography variant="h1">Farms</Typography>
        <Button variant="contained" startIcon={<AddIcon />} onClick={() => setCreating(true)}>
          New farm
        </Button>
      </Stack>
      <ErrorAlert error={farms.error} title="Farms could not be loaded" />
      <ClientFarms farmPath={paths.farm} reportPath={paths.report} />
      <FarmsTable farms={farms.data ?? []} loading={farms.isPending} />
      <FarmFormDialog
        open={creating}
        onClose={() => setCreating(false)}
        onSaved={(farm) => navigate(paths.farm(farm.id))}
      />
    </Stack>
  );
}
