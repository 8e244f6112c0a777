import { AddIcon } from '../../components/icons';
import { Box, Breadcrumbs, Button, Link, Stack, Tab, Tabs, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link as RouterLink, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { ConfirmDialog } from '../../components/confirm-dialog';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { paths } from '../../config/paths';
import { farmAllows, farmDetailQueryOptions, FarmFormDialog, FarmSummary, useDeleteFarm } from '../../features/farms';
import { farmHousesQueryOptions, HousesTable } from '../../features/houses';
import { ClimateSection } from '../../features/climate';
import { FuelPricesEditor, MissingPriceForm } from '../../features/fuel-prices';
import { MembersSection } from '../../features/members';
import { SeasonBudgetSection } from '../../features/season-budget';
import { CalibrationBasisSwitch, useHeatLossBasisParam } from '../../features/calibration';
import { farmTemperatureLogsQueryOptions, TemperatureLogsSection } from '../../features/temperature-logs';
import { referenceDataQueryOptions } from '../../lib/reference-data';
import { useCurrentUser } from '../session';
import { farmReportsQueryOptions, ReportLinks } from '../../features/reports';
import { PageTitle } from '../../components/page-title';

/** The farm page's tabs; the open one is kept in the URL (?tab=climate) so a reload keeps it. */
const FARM_TABS = [
  { id: 'houses', label: 'Houses' },
  { id: 'climate', label: 'Climate' },
  { id: 'temperature-logs', label: 'Temperature logs' },
  { id: 'season', label: 'Fuel & season budget' },
  { id: 'reports', label: 'Reports' },
  { id: 'members', label: 'Members' },
] as const;
type FarmTab = (typeof FARM_TABS)[number]['id'];

function isFarmTab(value: string | null): value is FarmTab {
  return FARM_TABS.some((tab) => tab.id === value);
}

export default function FarmPage() {
  const farmId = Number(useParams().farmId);
  const farm = useQuery(farmDetailQueryOptions(farmId));
  const houses = useQuery(farmHousesQueryOptions(farmId));
  const deleteFarm = useDeleteFarm();
  const navigate = useNavigate();
  const [editing, setEditing] = useState(false);
  const [confirmingDelete, setConfirmingDelete] = useState(false);
  const currentUser = useCurrentUser();
  const referenceData = useQuery(referenceDataQueryOptions());
  const [heatLossBasis, setHeatLossBasis] = useHeatLossBasisParam();
  const [searchParams, setSearchParams] = useSearchParams();
  const requestedTab = searchParams.get('tab');
  const tab: FarmTab = isFarmTab(requestedTab) ? requestedTab : 'houses';
  const logs = useQuery({ ...farmTemperatureLogsQueryOptions(farmId), enabled: tab === 'climate' });
  const openTab = (next: FarmTab) =>
    setSearchParams(next === 'houses' ? {} : { tab: next }, { replace: true, preventScrollReset: true });

  if (farm.isPending) return <LoadingState label="Loading farm…" />;
  if (farm.isError) return <ErrorAlert error={farm.error} title="Farm could not be loaded" />;

  return (
    <Stack spacing={3}>
      <PageTitle title={farm.data.name} />
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

      <Box sx={{ borderBottom: 1, borderColor: 'divider' }}>
        <Tabs
          value={tab}
          onChange={(_event, next: FarmTab) => openTab(next)}
          aria-label="Farm sections"
          variant="scrollable"
          scrollButtons="auto"
        >
          {FARM_TABS.map((item) => (
            <Tab
              key={item.id}
              value={item.id}
              label={item.label}
              id={`farm-tab-${item.id}`}
              aria-controls={`farm-tabpanel-${item.id}`}
            />
          ))}
        </Tabs>
      </Box>

      <Box role="tabpanel" id={`farm-tabpanel-${tab}`} aria-labelledby={`farm-tab-${tab}`}>
        {tab === 'houses' ? (
          <Stack component="section" aria-labelledby="houses-heading" spacing={2}>
            <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between' }}>
              <Typography id="houses-heading" variant="h2">
                Houses
              </Typography>
              {farmAllows(farm.data, 'house:write') ? (
                <Button variant="contained" startIcon={<AddIcon />} component={RouterLink} to={paths.newHouse(farmId)}>
                  New house
                </Button>
              ) : null}
            </Stack>
            <ErrorAlert error={houses.error} title="Houses could not be loaded" />
            <HousesTable houses={houses.data ?? []} loading={houses.isPending} />
          </Stack>
        ) : null}
        {tab === 'climate' ? (
          <ClimateSection farmId={farmId} canEdit={farmAllows(farm.data, 'house:write')} logs={logs.data ?? []} />
        ) : null}
        {tab === 'temperature-logs' ? (
          <TemperatureLogsSection farmId={farmId} canEdit={farmAllows(farm.data, 'house:write')} />
        ) : null}
        {tab === 'season' ? (
          <Stack spacing={3}>
            <Stack direction="row" spacing={2} useFlexGap sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
              <CalibrationBasisSwitch farmId={farmId} value={heatLossBasis} onChange={setHeatLossBasis} />
              <Button component={RouterLink} to={paths.fuelRecords(farmId)}>
                Fuel bills and calibration
              </Button>
            </Stack>
            <SeasonBudgetSection
              farmId={farmId}
              heatLossBasis={heatLossBasis}
              renderMissingPrice={(fuel) => (
                <MissingPriceForm
                  farmId={farmId}
                  fuel={fuel}
                  currency={farm.data.currency}
                  canEdit={farmAllows(farm.data, 'house:write')}
                />
              )}
            />
            {referenceData.data ? (
              <FuelPricesEditor
                farmId={farmId}
                currency={farm.data.currency}
                referenceData={referenceData.data}
                canEdit={farmAllows(farm.data, 'house:write')}
              />
            ) : (
              <ErrorAlert error={referenceData.error} title="Reference tables could not be loaded" />
            )}
          </Stack>
        ) : null}
        {tab === 'reports' ? <FarmReports farmId={farmId} /> : null}
        {tab === 'members' ? (
          <MembersSection
            farmId={farmId}
            canManage={farmAllows(farm.data, 'members:manage')}
            currentUserId={currentUser.data?.id}
            onLeftFarm={() => navigate(paths.farms, { replace: true })}
          />
        ) : null}
      </Box>

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

function FarmReports({ farmId }: { farmId: number }) {
  const reports = useQuery(farmReportsQueryOptions(farmId));
  return (
    <Stack component="section" aria-labelledby="farm-reports-heading" spacing={2}>
      <Typography id="farm-reports-heading" variant="h2">
        Reports
      </Typography>
      <Typography variant="body2" color="text.secondary">
        Heater-sizing reports of every house, newest first. Start one from a house page.
      </Typography>
      <ErrorAlert error={reports.error} title="Reports could not be loaded" />
      <ReportLinks reports={reports.data ?? []} reportPath={paths.report} />
    </Stack>
  );
}
