import ExpandMoreIcon from '@mui/icons-material/ExpandMore';
import {
  Accordion,
  AccordionDetails,
  AccordionSummary,
  Alert,
  Box,
  Chip,
  Grid,
  LinearProgress,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import type { CoolingConditionsSource, CoolingEstimate, House, HouseSpec, ReferenceData } from '../../../api/types';
import {
  AssumptionList,
  CautionsAlert,
  EstimateError,
  Figure,
  formatPercent,
  NoPermissionNote,
  ResultPanel,
} from '../../../components/estimate-parts';
import { ErrorAlert } from '../../../components/feedback';
import { houseSpecOf } from '../../../lib/house-spec';
import { referenceDataQueryOptions, referenceLabel } from '../../../lib/reference-data';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useUnits, type Units } from '../../../lib/units';
import { hourRanges } from '../cooling-chart-data';
import { editedCoolingEstimateQueryOptions, storedCoolingEstimateQueryOptions } from '../queries';
import { DesignDayChart } from './design-day-chart';
import { EMPTY_PAD_WHAT_IF, PadWhatIf, parsePadWhatIf, type PadWhatIfValues } from './pad-what-if';

export interface CoolingPanelProps {
  /** the stored house (SI) */
  house: House;
  /** from farm.permissions: may this user run estimates? */
  canRunEstimates: boolean;
  /** the form's unsaved values (SI), or null when the form matches the stored house */
  editedHouse?: HouseSpec | null;
  /** the form holds invalid values: results are for the last valid ones */
  editsInvalid?: boolean;
}

const SOURCE_WORDS: Record<CoolingConditionsSource[keyof CoolingConditionsSource], string> = {
  'farm climate': 'farm climate',
  request: 'typed here',
  'calendar default': 'mid-summer default',
  'reference data': 'default',
  'house length': 'house length',
  none: 'none',
};

const fmtNumber = (value: number, decimals: number) =>
  new Intl.NumberFormat('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals }).format(value);

function FanVerdict({ estimate, units }: { estimate: CoolingEstimate; units: Units }) {
  const capacity = estimate.capacity;
  const installed = units.format('airFlow', capacity.installedFlowM3PerS);
  const required = units.format('airFlow', capacity.requiredFlowM3PerS);
  if (capacity.verdict === 'adequate') {
    return (
      <Alert severity="success" data-testid="fan-verdict">
        <strong>Fans are adequate.</strong> {installed} installed covers the {required} required.
      </Alert>
    );
  }
  if (capacity.verdict === 'no-fans') {
    return (
      <Alert severity="error" data-testid="fan-verdict">
        <strong>No exhaust fans entered.</strong> The house needs {required} of exhaust.
      </Alert>
    );
  }
  return (
    <Alert severity="error" data-testid="fan-verdict">
      <strong>Fans are short:</strong> {installed} installed against {required} required.{' '}
      {capacity.fansNeeded !== null ? (
        <>
          <strong>
            {capacity.fansNeeded} fans of this size are needed in all
            {capacity.additionalFansNeeded ? ` (add ${capacity.additionalFansNeeded})` : ''}.
          </strong>
        </>
      ) : null}
    </Alert>
  );
}

function CapacityFactors({ estimate }: { estimate: CoolingEstimate }) {
  const factors = estimate.capacity.factors;
  const rows: [string, number][] = [
    ['Elevation', factors.elevation],
    ['Light', factors.light],
    ['Temperature rise', factors.temperatureRise],
    ['House (elevation × light × rise)', factors.house],
    ['Inlet-to-fan distance (velocity)', factors.velocity],
    ['Applied (larger of house and distance)', factors.applied],
  ];
  return (
    <Table size="small" aria-label="Capacity factors">
      <TableBody>
        {rows.map(([label, value]) => (
          <TableRow key={label}>
            <TableCell>{label}</TableCell>
            <TableCell align="right">× {fmtNumber(value, 3)}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}

function PadsResult({
  estimate,
  units,
  referenceData,
}: {
  estimate: CoolingEstimate;
  units: Units;
  referenceData: ReferenceData | undefined;
}) {
  const pads = estimate.pads;
  if (!pads) return null;
  return (
    <Stack spacing={1}>
      <Alert severity={pads.verdict === 'adequate' ? 'success' : 'warning'}>
        {referenceLabel(referenceData, 'evaporative-pads', pads.padTypeId)}:{' '}
        {pads.verdict === 'adequate'
          ? `${units.format('area', pads.areaM2)} is enough (${units.format('area', pads.areaNeededM2)} needed).`
          : `${units.format('area', pads.areaM2)} is short of the ${units.format('area', pads.areaNeededM2)} needed at the design face velocity.`}
      </Alert>
      <Grid container spacing={2}>
        <Grid size={6}>
          <Figure label="Face velocity" value={units.format('velocity', pads.faceVelocityMPerS)} />
        </Grid>
        <Grid size={6}>
          <Figure label="Saturation efficiency" value={formatPercent(pads.saturationEfficiency)} />
        </Grid>
        <Grid size={6}>
          <Figure
            label="Air leaving the pads at the peak"
            value={units.format('temperature', pads.leavingAirAtPeakC)}
          />
        </Grid>
        <Grid size={6}>
          <Figure
            label="Peak indoor with pads"
            value={units.format('temperature', estimate.designDay.peakIndoorWithPadsC)}
          />
        </Grid>
      </Grid>
    </Stack>
  );
}

/**
 * Summer ventilation and cooling for one house: air exchange, installed against required fan
 * capacity with its factors, fans needed, inlet area, staging, the design day hour by hour,
 * an evaporative pad what-if, winter ventilation and the electrical cautions.
 */
export function CoolingPanel({ house, canRunEstimates, editedHouse = null, editsInvalid = false }: CoolingPanelProps) {
  const units = useUnits();
  const referenceData = useQuery(referenceDataQueryOptions());
  const [padWhatIf, setPadWhatIf] = useState<PadWhatIfValues>(EMPTY_PAD_WHAT_IF);
  const settledPad = useDebouncedValue(padWhatIf, 400);
  const whatIfConditions = useMemo(() => {
    const { pad } = parsePadWhatIf(settledPad, units);
    return pad ? { evaporativePad: pad } : {};
  }, [settledPad, units]);

  const stored = useQuery({
    ...storedCoolingEstimateQueryOptions(house.id, house.updatedAt, whatIfConditions),
    enabled: canRunEstimates,
  });
  const storedResult = stored.data && !stored.isPlaceholderData ? stored.data : undefined;
  const edited = useQuery({
    ...editedCoolingEstimateQueryOptions(
      house.id,
      editedHouse ?? houseSpecOf(house),
      storedResult?.siteUsed ?? { latitudeDeg: 0, longitudeDeg: 0, elevationM: 0 },
      storedResult?.conditionsUsed ?? { designDate: '', summerDesignC: 0, dailyRangeK: 0, summerDesignWetBulbC: 0 },
    ),
    enabled: canRunEstimates && editedHouse !== null && storedResult !== undefined,
  });

  if (!canRunEstimates) {
    return (
      <ResultPanel headingId="cooling-panel-heading" title="Cooling and ventilation">
        <NoPermissionNote what="cooling estimates" />
      </ResultPanel>
    );
  }

  const showingEdits = Boolean(editedHouse && edited.data);
  const estimate: CoolingEstimate | undefined = showingEdits ? edited.data : stored.data;
  const spec = editedHouse ?? house;
  const busy = stored.isFetching || edited.isFetching;
  const floorAreaM2 = spec.spans * spec.widthM * spec.lengthM;

  return (
    <ResultPanel
      headingId="cooling-panel-heading"
      title="Cooling and ventilation"
      unsavedEdits={Boolean(editedHouse && edited.data)}
      busy={busy}
    >
      <Box sx={{ height: 4 }}>{busy ? <LinearProgress aria-label="Updating the cooling estimate" /> : null}</Box>

      {stored.error && !stored.data ? (
        <EstimateError error={stored.error} farmId={house.farmId} what="cooling estimates" missingClimateHint="." />
      ) : null}
      {edited.error ? <ErrorAlert error={edited.error} title="Your unsaved edits could not be computed" /> : null}
      {editsInvalid ? (
        <Alert severity="info">
          Some fields in the form are not valid: these results are for the last valid values.
        </Alert>
      ) : null}

      {!estimate && !stored.error ? (
        <Typography color="text.secondary" role="status">
          Computing the cooling estimate…
        </Typography>
      ) : null}

      {estimate && stored.data ? (
        <>
          <Grid container spacing={2}>
            <Grid size={6}>
              <Figure
                label={`Summer design dry bulb (${SOURCE_WORDS[stored.data.conditionsSource.summerDesignC]})`}
                value={units.format('temperature', stored.data.conditionsUsed.summerDesignC)}
              />
            </Grid>
            <Grid size={6}>
              <Figure
                label={`Coincident wet bulb (${SOURCE_WORDS[stored.data.conditionsSource.summerDesignWetBulbC]})`}
                value={units.format('temperature', stored.data.conditionsUsed.summerDesignWetBulbC)}
              />
            </Grid>
            <Grid size={6}>
              <Figure
                label={`Daily range (${SOURCE_WORDS[stored.data.conditionsSource.dailyRangeK]})`}
                value={units.format('temperatureDifference', stored.data.conditionsUsed.dailyRangeK)}
              />
            </Grid>
            <Grid size={6}>
              <Figure
                label={`Design day (${SOURCE_WORDS[stored.data.conditionsSource.designDate]})`}
                value={estimate.designDay.date}
              />
            </Grid>
          </Grid>

          <FanVerdict estimate={estimate} units={units} />

          <Grid container spacing={2}>
            <Grid size={6}>
              <Figure
                label="Air changes with all fans"
                value={`${fmtNumber(estimate.airExchange.airChangesPerHour, 1)} per hour · ${fmtNumber(
                  estimate.airExchange.airChangesPerMinute,
                  2,
                )} per minute`}
              />
            </Grid>
            <Grid size={6}>
              <Figure
                label="Installed flow per floor area"
                value={units.format('airFlowPerFloorArea', estimate.airExchange.flowPerFloorAreaM3PerSM2)}
              />
            </Grid>
            <Grid size={6}>
              <Figure
                label="Installed exhaust"
                value={units.format('airFlow', estimate.capacity.installedFlowM3PerS)}
              />
            </Grid>
            <Grid size={6}>
              <Figure
                label="Required exhaust"
                value={`${units.format('airFlow', estimate.capacity.requiredFlowM3PerS)} (${units.format(
                  'airFlowPerFloorArea',
                  floorAreaM2 > 0 ? estimate.capacity.requiredFlowM3PerS / floorAreaM2 : null,
                )})`}
              />
            </Grid>
            <Grid size={12}>
              <Figure
                label="Inlet free area"
                value={
                  <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }} component="span">
                    <span>
                      {units.format('area', estimate.capacity.inletAreaM2)} entered,{' '}
                      {units.format('area', estimate.capacity.inletAreaNeededM2)} needed
                    </span>
                    <Chip
                      size="small"
                      variant="outlined"
                      color={estimate.capacity.inletVerdict === 'adequate' ? 'success' : 'warning'}
                      label={estimate.capacity.inletVerdict === 'adequate' ? 'enough' : 'too small'}
                    />
                  </Stack>
                }
              />
            </Grid>
          </Grid>

          <Accordion disableGutters>
            <AccordionSummary expandIcon={<ExpandMoreIcon />}>
              <Typography variant="h4" component="h4">
                How the required rate is built
              </Typography>
            </AccordionSummary>
            <AccordionDetails>
              <Typography variant="body2" sx={{ mb: 1 }}>
                Base rate {units.format('airFlowPerFloorArea', estimate.capacity.baseRateM3PerSM2)} of floor, times:
              </Typography>
              <CapacityFactors estimate={estimate} />
            </AccordionDetails>
          </Accordion>

          <Accordion defaultExpanded disableGutters>
            <AccordionSummary expandIcon={<ExpandMoreIcon />}>
              <Typography variant="h4" component="h4">
                Design day
              </Typography>
            </AccordionSummary>
            <AccordionDetails>
              <Stack spacing={1.5}>
                <DesignDayChart hours={estimate.designDay.hours} coolingSetpointC={spec.setpoints.coolingC} />
                <Grid container spacing={2}>
                  <Grid size={6}>
                    <Figure
                      label="Peak indoor with fans"
                      value={units.format('temperature', estimate.designDay.peakIndoorWithFansC)}
                    />
                  </Grid>
                  <Grid size={6}>
                    <Figure
                      label="Hours the setpoint is not held"
                      testId="hours-not-held"
                      value={
                        estimate.designDay.hoursNotHeld.length === 0
                          ? 'none'
                          : `${estimate.designDay.hoursNotHeld.length} (solar ${hourRanges(estimate.designDay.hoursNotHeld)} h)`
                      }
                    />
                  </Grid>
                </Grid>
                <Typography variant="body2" color="text.secondary">
                  Cooling setpoint {units.format('temperature', spec.setpoints.coolingC)}. Ventilation alone cannot cool
                  below the outdoor air; pads cool toward the wet bulb.
                </Typography>
                <PadWhatIf
                  values={padWhatIf}
                  onChange={setPadWhatIf}
                  units={units}
                  referenceData={referenceData.data}
                />
                <PadsResult estimate={estimate} units={units} referenceData={referenceData.data} />
              </Stack>
            </AccordionDetails>
          </Accordion>

          <Accordion disableGutters>
            <AccordionSummary expandIcon={<ExpandMoreIcon />}>
              <Typography variant="h4" component="h4">
                Fan staging{estimate.staging.ok ? '' : ' (check)'}
              </Typography>
            </AccordionSummary>
            <AccordionDetails>
              <Stack spacing={1}>
                {estimate.staging.warnings.map((warning) => (
                  <Alert key={warning} severity="warning">
                    {units.prose(warning)}
                  </Alert>
                ))}
                <Typography variant="body2">
                  Gap between night heating and the first fan stage:{' '}
                  {units.format('temperatureDifference', estimate.staging.deadbandK)} (at least{' '}
                  {units.format('temperatureDifference', estimate.staging.requiredDeadbandK)}).
                </Typography>
                <Table size="small" aria-label="Suggested fan stages">
                  <TableHead>
                    <TableRow>
                      <TableCell>Stage</TableCell>
                      <TableCell align="right">On at</TableCell>
                      <TableCell align="right">Fans</TableCell>
                    </TableRow>
                  </TableHead>
                  <TableBody>
                    {estimate.staging.stages.map((stage) => (
                      <TableRow key={stage.stage}>
                        <TableCell>{stage.stage}</TableCell>
                        <TableCell align="right">{units.format('temperature', stage.onAtC)}</TableCell>
                        <TableCell align="right">{stage.fans}</TableCell>
                      </TableRow>
                    ))}
                  </TableBody>
                </Table>
              </Stack>
            </AccordionDetails>
          </Accordion>

          <Accordion disableGutters>
            <AccordionSummary expandIcon={<ExpandMoreIcon />}>
              <Typography variant="h4" component="h4">
                Winter fan stage
              </Typography>
            </AccordionSummary>
            <AccordionDetails>
              <Grid container spacing={2}>
                <Grid size={6}>
                  <Figure
                    label={`Rate (${formatPercent(estimate.winterVentilation.fractionOfSummerRate)} of summer)`}
                    value={units.format('airFlow', estimate.winterVentilation.flowM3PerS)}
                  />
                </Grid>
                <Grid size={6}>
                  <Figure
                    label="Air changes"
                    value={`${fmtNumber(estimate.winterVentilation.airChangesPerHour, 1)} per hour`}
                  />
                </Grid>
                <Grid size={6}>
                  <Figure
                    label={`Heat to warm it at ${units.format('temperature', estimate.winterVentilation.atOutdoorC)} outdoors`}
                    value={units.format('power', estimate.winterVentilation.heatCostW)}
                  />
                </Grid>
                <Grid size={6}>
                  <Figure
                    label="The house's own loss then"
                    value={units.format('power', estimate.winterVentilation.houseHeatLossW)}
                  />
                </Grid>
              </Grid>
              <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
                The winter fan stage is for cool sunny days and short humidity purges, not for running all night.
              </Typography>
            </AccordionDetails>
          </Accordion>

          <Accordion disableGutters>
            <AccordionSummary expandIcon={<ExpandMoreIcon />}>
              <Typography variant="h4" component="h4">
                Assumptions and sources ({estimate.assumptions.length})
              </Typography>
            </AccordionSummary>
            <AccordionDetails>
              <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
                Hover or focus a line for its source. Values marked “from memory” or “rule of thumb” are not yet checked
                against a primary table.
              </Typography>
              <AssumptionList assumptions={estimate.assumptions} units={units} />
            </AccordionDetails>
          </Accordion>

          <CautionsAlert title="Cautions" cautions={estimate.cautions} />
        </>
      ) : null}
    </ResultPanel>
  );
}
