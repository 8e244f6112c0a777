import { AddIcon } from '../../../components/icons';
import {
  Alert,
  Box,
  Button,
  MenuItem,
  Paper,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  TextField,
  Typography,
} from '@mui/material';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import type { Measure, MeasureKind, SeasonRequest } from '../../../api/types';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import { referenceDataQueryOptions, referenceRows } from '../../../lib/reference-data';
import { useUnits } from '../../../lib/units';
import {
  ADDABLE_MEASURE_KINDS,
  isValidCost,
  lightChangeText,
  MEASURE_KIND_LABELS,
  measuresRequestBody,
  paybackText,
  rowsFromComparison,
  rowsFromMeasures,
  UPGRADE_HEATER_TYPES,
  type MeasureRow,
} from '../measures-values';
import { usePutMeasurePlan } from '../mutations';
import { measurePlanQueryOptions, measuresQueryOptions } from '../queries';

/** Energy measures for this house, each priced by the user and ranked by simple payback. */
export function MeasuresPanel({
  houseId,
  climateSource,
  alternativeId,
  priceFields = {},
  heatLossBasis,
  canSavePlan = false,
}: {
  houseId: number;
  /** a fuel-price what-if of the page (not saved) */
  priceFields?: Pick<SeasonRequest, 'pricePerUnit' | 'priceUnit'>;
  climateSource: SeasonRequest['climateSource'];
  /** run for one of the house's alternatives */
  alternativeId?: number;
  /** 'calibrated': heat loss × the house's factor from the farm's fuel bills */
  heatLossBasis?: SeasonRequest['heatLossBasis'];
  /** the user may keep the measures and costs with the house (house:write) */
  canSavePlan?: boolean;
}) {
  const units = useUnits();
  // The house keeps its measures and costs; an alternative is compared with the house's list, unsaved.
  const plan = useQuery({ ...measurePlanQueryOptions(houseId), enabled: !alternativeId });
  const savePlan = usePutMeasurePlan(houseId);
  const planReady = Boolean(alternativeId) || plan.isSuccess || plan.isError;
  const referenceData = useQuery(referenceDataQueryOptions());
  const heaterTypeLabels = new Map(
    referenceRows(referenceData.data, 'heater-types').map((row) => [String(row.heaterType), String(row.label)]),
  );
  // [] asks the API for its default measures at cost 0; after that, the user's list and costs.
  const [chosen, setRequested] = useState<Measure[] | null>(null);
  // until the user compares, the measures kept with the house (or [] for the API's defaults)
  const requested = chosen ?? plan.data?.measures ?? [];
  const [rows, setRows] = useState<MeasureRow[] | null>(null);
  const [kindToAdd, setKindToAdd] = useState<MeasureKind>('second-poly-layer');
  const comparison = useQuery({
    ...measuresQueryOptions(houseId, {
      ...priceFields,
      measures: requested,
      climateSource,
      ...(alternativeId ? { alternativeId } : {}),
      ...(heatLossBasis === 'calibrated' ? { heatLossBasis } : {}),
    }),
    placeholderData: keepPreviousData,
    enabled: planReady,
  });

  // Measures kept with the house come back as they were left; otherwise the API's defaults, unpriced.
  useEffect(() => {
    if (rows !== null || !plan.data || plan.data.measures.length === 0) return;
    setRows(rowsFromMeasures(plan.data.measures));
  }, [rows, plan.data]);
  useEffect(() => {
    if (rows === null && comparison.data?.defaultsUsed) setRows(rowsFromComparison(comparison.data));
  }, [rows, comparison.data]);

  /** Compares these rows and, where the user may, keeps them with the house for next time. */
  const compare = (next: MeasureRow[]) => {
    const measures = measuresRequestBody(next);
    setRequested(measures);
    if (canSavePlan && !alternativeId && plan.data) savePlan.mutate({ body: { measures }, version: plan.data.version });
  };
  const setHeaterType = (index: number, heaterType: NonNullable<Measure['heaterType']>) =>
    setRows(
      (current) =>
        current?.map((row, at) => (at === index ? { ...row, settings: { ...row.settings, heaterType } } : row)) ?? null,
    );

  const allCostsValid = (rows ?? []).every((row) => isValidCost(row.cost));
  const setCost = (index: number, cost: string) =>
    setRows((current) => current?.map((row, at) => (at === index ? { ...row, cost } : row)) ?? null);
  const result = comparison.data;
  const baselineFuel = result?.baseline;
  const currency = result?.inputsUsed.currency ?? '';

  return (
    <Paper component="section" aria-labelledby="measures-heading" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Typography id="measures-heading" variant="h3" component="h2">
          Energy measures ranked by payback
        </Typography>
        <Typography variant="body2" color="text.secondary">
          Enter what each measure would cost (installed, in the farm&apos;s currency), then rank them. Each is compared
          alone against the house as it is.
        </Typography>
        {!planReady ? <LoadingState label="Loading the measures kept with the house…" /> : null}
        {planReady && comparison.isPending ? (
          <LoadingState label="Comparing measures (each re-runs the season)…" />
        ) : null}
        <ErrorAlert error={comparison.error} title="The measures could not be compared" />
        {comparison.isError && rows && rows.length > 0 && requested.length > 0 ? (
          <Box>
            <Button
              onClick={() => {
                const fewer = rows.slice(0, -1);
                setRows(fewer);
                compare(fewer);
              }}
            >
              Remove the last measure ({MEASURE_KIND_LABELS[rows[rows.length - 1]!.kind]})
            </Button>
          </Box>
        ) : null}
        {result && rows ? (
          <>
            {baselineFuel ? (
              <Typography variant="body2">
                As it is, the house burns {units.fuel(baselineFuel, baselineFuel)} a season
                {baselineFuel.cost === null
                  ? ' (no fuel price yet, so savings are in fuel and heat only).'
                  : `, costing ${units.money(baselineFuel.cost, currency, 0)}.`}
              </Typography>
            ) : null}
            <TableContainer>
              <Table size="small" aria-label="Measures ranked by payback">
                <TableHead>
                  <TableRow>
                    <TableCell>Rank</TableCell>
                    <TableCell sx={{ minWidth: 220 }}>Measure</TableCell>
                    <TableCell sx={{ minWidth: 120 }}>Cost</TableCell>
                    <TableCell align="right">Saves a season</TableCell>
                    <TableCell align="right">Fuel saved</TableCell>
                    <TableCell align="right">Heat saved ({units.label('energyKWh')})</TableCell>
                    <TableCell align="right">Payback</TableCell>
                    <TableCell sx={{ minWidth: 180 }}>Light to the crop</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {result.measures.map((measure, rank) => {
                    const row = rows[measure.index];
                    const fuelSaved =
                      measure.fuelSavedSi === null || measure.fuelSavedUs === null || !baselineFuel
                        ? '—'
                        : units.fuel(
                            { fuelQuantitySi: measure.fuelSavedSi, fuelQuantityUs: measure.fuelSavedUs },
                            baselineFuel,
                          );
                    return (
                      <TableRow key={`${measure.index}-${measure.kind}`} data-applicable={measure.applicable}>
                        <TableCell>{measure.applicable ? rank + 1 : '—'}</TableCell>
                        <TableCell>
                          <Typography variant="body2" sx={{ fontWeight: 500 }}>
                            {measure.label}
                          </Typography>
                          <Typography variant="caption" color="text.secondary" component="div">
                            {units.prose(measure.description)}
                          </Typography>
                          {row?.kind === 'heater-efficiency' ? (
                            <TextField
                              select
                              size="small"
                              label="New heaters"
                              value={row.settings?.heaterType ?? 'condensing'}
                              onChange={(event) =>
                                setHeaterType(measure.index, event.target.value as NonNullable<Measure['heaterType']>)
                              }
                              sx={{ mt: 1, minWidth: 220 }}
                            >
                              {UPGRADE_HEATER_TYPES.map((type) => (
                                <MenuItem key={type} value={type}>
                                  {heaterTypeLabels.get(type) ?? type}
                                </MenuItem>
                              ))}
                            </TextField>
                          ) : null}
                          {measure.notes.map((note) => (
                            <Typography variant="caption" color="warning.main" component="div" key={note}>
                              {units.prose(note)}
                            </Typography>
                          ))}
                        </TableCell>
                        <TableCell>
                          {row ? (
                            <TextField
                              value={row.cost}
                              onChange={(event) => setCost(measure.index, event.target.value)}
                              placeholder="0"
                              error={!isValidCost(row.cost)}
                              slotProps={{
                                htmlInput: { inputMode: 'decimal', 'aria-label': `Cost of: ${measure.label}` },
                              }}
                            />
                          ) : measure.costAmount === null ? (
                            '—'
                          ) : (
                            units.money(measure.costAmount, currency, 0)
                          )}
                        </TableCell>
                        {measure.applicable ? (
                          <>
                            <TableCell align="right">
                              {units.money(measure.yearlyMoneySaved, currency, 0)}
                              {measure.yearlyMoneySaved !== null && measure.yearlyMoneySaved < 0 ? (
                                <Typography variant="caption" color="warning.main" component="div">
                                  costs more to run
                                </Typography>
                              ) : null}
                            </TableCell>
                            <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                              {fuelSaved}
                            </TableCell>
                            <TableCell align="right">
                              {units.format('energyKWh', measure.heatSavedKWh, { withoutUnit: true })}
                            </TableCell>
                            <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                              {paybackText(measure)}
                            </TableCell>
                            <TableCell>{lightChangeText(measure, units)}</TableCell>
                          </>
                        ) : (
                          <TableCell colSpan={5}>
                            <Typography variant="body2" color="text.secondary" component="div">
                              Does not apply: {units.prose(measure.notApplicableReason ?? '')}
                            </Typography>
                          </TableCell>
                        )}
                      </TableRow>
                    );
                  })}
                </TableBody>
              </Table>
            </TableContainer>
            <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
              <Button
                variant="contained"
                disabled={!allCostsValid || comparison.isFetching}
                onClick={() => compare(rows)}
              >
                {comparison.isFetching ? 'Ranking…' : 'Rank by payback'}
              </Button>
              <TextField
                select
                label="Another measure"
                value={kindToAdd}
                onChange={(event) => setKindToAdd(event.target.value as MeasureKind)}
                sx={{ maxWidth: 280 }}
              >
                {ADDABLE_MEASURE_KINDS.map((kind) => (
                  <MenuItem key={kind} value={kind}>
                    {MEASURE_KIND_LABELS[kind]}
                  </MenuItem>
                ))}
              </TextField>
              <Button
                startIcon={<AddIcon />}
                onClick={() => {
                  const next = [...rows, { kind: kindToAdd, cost: '' }];
                  setRows(next);
                  if (next.every((row) => isValidCost(row.cost))) compare(next);
                }}
              >
                Add and compare
              </Button>
            </Stack>
            {!allCostsValid ? <Alert severity="error">Costs must be numbers of 0 or more.</Alert> : null}
            <ErrorAlert error={savePlan.error} title="The measures and costs could not be kept with the house" />
            {savePlan.isSuccess ? (
              <Typography variant="body2" color="text.secondary" role="status">
                Kept with the house: these measures and costs are here next time.
              </Typography>
            ) : null}
            <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
              {result.notes.map((note) => (
                <Typography component="li" variant="body2" color="text.secondary" key={note}>
                  {units.prose(note)}
                </Typography>
              ))}
            </Box>
          </>
        ) : null}
      </Stack>
    </Paper>
  );
}
