import { Alert, Box, Breadcrumbs, Button, Grid, Link, Stack, Typography } from '@mui/material';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useMemo, useState } from 'react';
import { Link as RouterLink, useNavigate, useParams } from 'react-router-dom';
import { ConfirmDialog } from '../../components/confirm-dialog';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { useSaveConflict } from '../../components/save-conflict';
import { UnsavedChangesGuard } from '../../components/unsaved-changes-guard';
import { paths } from '../../config/paths';
import type { AdoptAlternativeResult, HouseInput, HouseSpec } from '../../api/types';
import { AlternativesSection, SaveAlternativeDialog, useCreateAlternative } from '../../features/alternatives';
import { CoolingPanel } from '../../features/cooling-estimate';
import { farmAllows, farmDetailQueryOptions } from '../../features/farms';
import { HeatingPanel, HeatingSummaryBar } from '../../features/heating-estimate';
import { HouseReports } from '../../features/reports';
import {
  HouseForm,
  houseDetailQueryOptions,
  houseInputOf,
  useDeleteHouse,
  useDuplicateHouse,
  useUpdateHouse,
} from '../../features/houses';
import { houseSpecOf } from '../../lib/house-spec';
import { referenceDataQueryOptions } from '../../lib/reference-data';
import { useDebouncedValue } from '../../lib/use-debounced-value';
import { PageTitle } from '../../components/page-title';
import { houseKeys, seasonKeys } from '../../api/query-keys';

/** The form's unsaved edits as the result panels use them: null spec = show the stored house. */
interface FormEdits {
  houseId: number | null;
  editedHouse: HouseSpec | null;
  editsInvalid: boolean;
}

const NO_EDITS: FormEdits = { houseId: null, editedHouse: null, editsInvalid: false };

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
  const saveConflict = useSaveConflict({ what: 'house', mutation: updateHouse, queryKey: houseKeys.detail(houseId) });
  const deleteHouse = useDeleteHouse();
  const navigate = useNavigate();
  const [confirmingDelete, setConfirmingDelete] = useState(false);
  const [savingAlternative, setSavingAlternative] = useState(false);
  // Remounting the form (a new key) drops its edits, e.g. once they are kept as an alternative.
  const [formGeneration, setFormGeneration] = useState(0);
  const createAlternative = useCreateAlternative(houseId);
  const duplicateHouse = useDuplicateHouse(houseId);
  const queryClient = useQueryClient();
  const houseInput = useMemo(() => (house.data ? houseInputOf(house.data) : undefined), [house.data]);
  // Panels follow the form as the user types (debounced); invalid values keep the last valid ones.
  const [formEdits, setFormEdits] = useState<FormEdits>(NO_EDITS);
  const onFormValuesChange = useCallback(
    (input: HouseInput | null, { dirty }: { dirty: boolean }) => {
      setFormEdits((previous) => {
        if (!dirty) return previous === NO_EDITS ? previous : NO_EDITS;
        if (!input) return { houseId, editedHouse: previous.editedHouse, editsInvalid: true };
        return { houseId, editedHouse: houseSpecOf(input), editsInvalid: false };
      });
    },
    [houseId],
  );
  const debouncedEdits = useDebouncedValue(formEdits, 400);
  // Never another house's edits (the page stays mounted when moving between houses).
  const settledEdits = debouncedEdits.houseId === houseId ? debouncedEdits : NO_EDITS;

  if (house.isError) return <ErrorAlert error={house.error} title="House could not be loaded" />;
  if (farm.isError) return <ErrorAlert error={farm.error} title="Farm could not be loaded" />;
  if (referenceData.isError) {
    return <ErrorAlert error={referenceData.error} title="Reference tables could not be loaded" />;
  }
  if (!house.data || !houseInput || !farm.data || !referenceData.data) return <LoadingState label="Loading house…" />;

  const canWrite = farmAllows(farm.data, 'house:write');
  const canWriteAlternatives = farmAllows(farm.data, 'alternative:write');
  const canRunEstimates = farmAllows(farm.data, 'estimate:run');
  // the unsaved edits right now (not debounced): what "Save as alternative" keeps and leaving asks about
  const liveEdits = formEdits.houseId === houseId ? formEdits : NO_EDITS;
  const hasEdits = liveEdits !== NO_EDITS;
  const onAdopted = (result: AdoptAlternativeResult) => {
    queryClient.setQueryData(houseKeys.detail(result.house.id), result.house);
    void queryClient.invalidateQueries({ queryKey: houseKeys.list(result.house.farmId) });
    void queryClient.invalidateQueries({ queryKey: seasonKeys.all });
  };

  return (
    <Stack spacing={2}>
      <PageTitle title={house.data.name} />
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
      <Stack direction="row" sx={{ flexWrap: 'wrap', columnGap: 3, rowGap: 1 }}>
        <Link component={RouterLink} to={paths.houseSeason(house.data.id)}>
          Heating season, fuel budget and measures →
        </Link>
        <Link component={RouterLink} to={paths.houseSideBySide(house.data.id)}>
          Alternatives side by side →
        </Link>
      </Stack>
      <HeatingSummaryBar house={house.data} editedHouse={settledEdits.editedHouse} canRunEstimates={canRunEstimates} />
      {!canWrite && canWriteAlternatives ? (
        <Alert severity="info">
          Your role lets you try changes to this house and save them as an alternative (a proposal the grower can
          compare and adopt), but not change the house itself.
        </Alert>
      ) : null}

      <Grid container spacing={3} sx={{ alignItems: 'flex-start' }}>
        <Grid size={{ xs: 12, lg: 7 }}>
          <HouseForm
            key={formGeneration}
            house={houseInput}
            referenceData={referenceData.data}
            readOnly={!canWrite && !canWriteAlternatives}
            canSave={canWrite}
            onSubmit={async (input) => {
              await updateHouse.mutateAsync({ body: input, version: house.data.version });
            }}
            onValuesChange={onFormValuesChange}
            actions={
              <>
                {canWrite ? (
                  <Button color="error" onClick={() => setConfirmingDelete(true)}>
                    Delete house
                  </Button>
                ) : null}
                {canWrite ? (
                  <Button
                    disabled={duplicateHouse.isPending}
                    onClick={() => duplicateHouse.mutate({}, { onSuccess: (copy) => navigate(paths.house(copy.id)) })}
                  >
                    Duplicate house
                  </Button>
                ) : null}
                {canWriteAlternatives ? (
                  <Button
                    variant="outlined"
                    disabled={!hasEdits || liveEdits.editsInvalid || !liveEdits.editedHouse}
                    onClick={() => {
                      createAlternative.reset();
                      setSavingAlternative(true);
                    }}
                  >
                    Save as alternative
                  </Button>
                ) : null}
              </>
            }
          />
          <ErrorAlert error={duplicateHouse.error} title="Not duplicated" />
        </Grid>

        <Grid size={{ xs: 12, lg: 5 }}>
          {/* Not sticky: the result panels are taller than the window. */}
          <Box component="aside" aria-labelledby="house-results-heading">
            <Typography id="house-results-heading" variant="h2" sx={{ mb: 2 }}>
              Results
            </Typography>
            <Stack spacing={2}>
              <AlternativesSection
                houseId={house.data.id}
                canWrite={canWriteAlternatives}
                canAdopt={canWrite}
                canRun={canRunEstimates}
                onAdopted={onAdopted}
                currency={farm.data.currency}
              />
              {/*
                RESULT PANELS SLOT — add the heating, cooling and season panels here, one per line,
                each taking the stored house (SI) and its farm, e.g.
                  <HeatingPanel house={house.data} farm={farm.data} />
                Panels come from their own features; this page is where they meet the house.
                `settledEdits` carries the form's unsaved values (debounced) for panels that follow them.
              */}
              <HeatingPanel
                house={house.data}
                canRunEstimates={canRunEstimates}
                editedHouse={settledEdits.editedHouse}
                editsInvalid={settledEdits.editsInvalid}
              />
              <CoolingPanel
                house={house.data}
                canRunEstimates={canRunEstimates}
                editedHouse={settledEdits.editedHouse}
                editsInvalid={settledEdits.editsInvalid}
              />
              <HouseReports
                houseId={house.data.id}
                houseName={house.data.name}
                canWrite={farmAllows(farm.data, 'report:write')}
                reportPath={paths.report}
                onCreated={(report) => navigate(paths.report(report.id))}
              />
            </Stack>
          </Box>
        </Grid>
      </Grid>

      {saveConflict}
      <UnsavedChangesGuard dirty={hasEdits && !savingAlternative && !updateHouse.isPending} />
      {savingAlternative ? (
        <SaveAlternativeDialog
          open
          busy={createAlternative.isPending}
          error={createAlternative.error}
          onClose={() => setSavingAlternative(false)}
          onSave={({ name, costAmount }) =>
            liveEdits.editedHouse &&
            createAlternative.mutate(
              { name, costAmount, house: { ...liveEdits.editedHouse } },
              {
                onSuccess: () => {
                  setSavingAlternative(false);
                  setFormEdits(NO_EDITS);
                  setFormGeneration((generation) => generation + 1);
                },
              },
            )
          }
        />
      ) : null}
      <ConfirmDialog
        open={confirmingDelete}
        title={`Delete ${house.data.name}?`}
        message="The house, its production calendar and all its alternatives are removed for every member of the farm. This cannot be undone."
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
