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
import type { HeatingConditionsSource, HeatingEstimate, House, HouseSpec, ReferenceData } from '../../../api/types';
import {
  AssumptionList,
  CautionsAlert,
  EstimateError,
  Figure,
  isMissingClimateError,
  NoPermissionNote,
  ResultPanel,
} from '../../../components/estimate-parts';
import { ErrorAlert } from '../../../components/feedback';
import { houseSpecOf } from '../../../lib/house-spec';
import { referenceDataQueryOptions, referenceRows } from '../../../lib/reference-data';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useUnits, type Units } from '../../../lib/units';
import { heatLossRows } from '../heating-chart-data';
import {
  editedHeatingEstimateQueryOptions,
  statelessHeatingConditions,
  storedHeatingEstimateQueryOptions,
} from '../queries';
import { HeatLossChart } from './heat-loss-chart';
import { EMPTY_HEATING_WHAT_IF, HeatingWhatIf, parseHeatingWhatIf, type HeatingWhatIfValues } from './heating-what-if';

export interface HeatingPanelProps {
  /** the stored house (SI) */
  house: House;
  /** from farm.permissions: may this user run estimates? */
  canRunEstimates: boolean;
  /** the form's unsaved values (SI), or null when the form matches the stored house */
  editedHouse?: HouseSpec | null;
  /** the form holds invalid values: results are for the last valid ones */
  editsInvalid?: boolean;
}

const SOURCE_WORDS = {
  'farm climate': 'farm climate',
  request: 'typed here',
  farm: 'farm',
  'reference data': 'default',
  'house night setpoint': 'night setpoint',
  default: 'default',
} as const;

function sourceWord(source: HeatingConditionsSource[keyof HeatingConditionsSource]): string {
  return SOURCE_WORDS[source];
}

const LAYER_WORDS: Record<number, string> = { 0: 'opaque', 1: 'single layer', 2: 'double layer', 3: 'triple layer' };

function coveringOf(
  referenceData: ReferenceData | undefined,
  coveringId: string,
): { label: string; layers: string | null } {
  const row = referenceRows(referenceData, 'coverings').find((candidate) => candidate.id === coveringId);
  const layers = typeof row?.layers === 'number' ? (LAYER_WORDS[row.layers] ?? `${row.layers} layers`) : null;
  return { label: row?.label ?? coveringId, layers };
}

function minimumUnitCount(estimate: HeatingEstimate): number {
  const value = estimate.assumptions.find((assumption) => assumption.key === 'heater.minimumUnitCount')?.value;
  return typeof value === 'number' && value >= 1 ? value : 2;
}

const NO_WRAP = { whiteSpace: 'nowrap' } as const;

const SURFACE_LABELS = { roof: 'Roof', sidewalls: 'Sidewalls', endwalls: 'Endwalls' } as const;

/** Heater verdict: adequate or short, what is installed against what is needed, and what one failure costs. */
function HeaterVerdict({ estimate, units }: { estimate: HeatingEstimate; units: Units }) {
  const heater = estimate.heater;
  const inside = units.format('temperature', estimate.heatLoss.insideC);
  const margin = `${Math.round(heater.safetyMargin * 100)} %`;
  const minimumUnits = minimumUnitCount(estimate);
  let verdict;
  if (heater.verdict === 'adequate') {
    verdict = (
      <Alert severity="success" data-testid="heater-verdict">
        <strong>Heaters are adequate.</strong> {units.format('power', heater.installedOutputW)} installed output covers
        the {units.format('power', heater.requiredOutputW)} required (design loss plus {margin} margin).
      </Alert>
    );
  } else if (heater.verdict === 'short') {
    verdict = (
      <Alert severity="error" data-testid="heater-verdict">
        <strong>Heaters are short by {units.format('power', heater.shortfallW)}.</strong>{' '}
        {units.format('power', heater.installedOutputW)} installed output against{' '}
        {units.format('power', heater.requiredOutputW)} required (design loss plus {margin} margin).
      </Alert>
    );
  } else {
    verdict = (
      <Alert severity="error" data-testid="heater-verdict">
        <strong>No heaters entered.</strong> {units.format('power', heater.requiredOutputW)} output is required (design
        loss plus {margin} margin).
      </Alert>
    );
  }

  let failureNote: string | null = null;
  if (heater.unitCount === 1) {
    failureNote =
      `A single unit is all the heat: if it fails the house has none. It alone holds ${inside} down to ` +
      `${units.format('temperature', heater.lowestHeldOutdoorC)} outside. Split the output over at least ${minimumUnits} units, ` +
      `for example ${minimumUnits} × ${units.format('power', heater.requiredOutputW / minimumUnits)} output.`;
  } else if (heater.unitCount > 1 && heater.holdsWithLargestUnitOutC !== null) {
    const rest = heater.unitCount === 2 ? 'the other unit alone holds' : 'the others hold';
    failureNote =
      `With the largest unit (${units.format('power', heater.largestUnitOutputW)} output) out of service, ${rest} ${inside} ` +
      `down to ${units.format('temperature', heater.holdsWithLargestUnitOutC)} outside.`;
  }

  return (
    <Stack spacing={1.5}>
      {verdict}
      <Grid container spacing={2}>
        <Grid size={6}>
          <Figure label="Installed output" value={units.format('power', heater.installedOutputW)} />
        </Grid>
        <Grid size={6}>
          <Figure label="Required output" value={units.format('power', heater.requiredOutputW)} />
        </Grid>
        <Grid size={6}>
          <Figure label="Installed input" value={units.format('power', heater.installedInputW)} />
        </Grid>
        <Grid size={6}>
          <Figure label="Required input" value={units.format('power', heater.requiredInputW)} />
        </Grid>
        <Grid size={12}>
          <Figure
            label="Lowest outdoor temperature the installed heaters hold"
            value={heater.lowestHeldOutdoorC === null ? '—' : units.format('temperature', heater.lowestHeldOutdoorC)}
          />
        </Grid>
      </Grid>
      {failureNote ? (
        <Typography variant="body2" color="text.secondary">
          {failureNote}
        </Typography>
      ) : null}
    </Stack>
  );
}

function CondensationVerdict({
  estimate,
  units,
  referenceData,
}: {
  estimate: HeatingEstimate;
  units: Units;
  referenceData: ReferenceData | undefined;
}) {
  const condensation = estimate.condensation;
  const dripping = condensation.surfaces.filter((surface) => surface.condenses);
  return (
    <Stack spacing={1}>
      <Alert severity={condensation.anyCondenses ? 'warning' : 'success'} data-testid="condensation-verdict">
        {condensation.anyCondenses
          ? `Water condenses on the ${dripping.map((surface) => SURFACE_LABELS[surface.group].toLowerCase()).join(', ')} on the design night.`
          : 'No condensation on the coverings on the design night.'}{' '}
        Inside dew point {units.format('temperature', condensation.dewPointC)} at{' '}
        {units.format('temperature', condensation.insideC)} and {condensation.insideRelativeHumidityPct} % RH.
      </Alert>
      <Table size="small" aria-label="Condensation by surface">
        <TableHead>
          <TableRow>
            <TableCell>Surface</TableCell>
            <TableCell align="right">Inside surface</TableCell>
            <TableCell align="right">Drips below outdoor</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {condensation.surfaces.map((surface) => {
            const covering = coveringOf(referenceData, surface.coveringId);
            return (
              <TableRow key={surface.group}>
                <TableCell>
                  <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
                    <span>{SURFACE_LABELS[surface.group]}</span>
                    <Chip
                      size="small"
                      color={surface.condenses ? 'warning' : 'success'}
                      variant="outlined"
                      label={surface.condenses ? 'drips' : 'dry'}
                    />
                  </Stack>
                  <Typography variant="caption" color="text.secondary" component="div">
                    {covering.layers ? <strong>{covering.layers}: </strong> : null}
                    {covering.label}, U {units.format('uValue', surface.uWPerM2K)}
                  </Typography>
                </TableCell>
                <TableCell align="right" sx={NO_WRAP}>
                  {units.format('temperature', surface.insideSurfaceC)}
                  <Typography variant="caption" color="text.secondary" component="div">
                    dew point {units.format('temperature', condensation.dewPointC)}
                  </Typography>
                </TableCell>
                <TableCell align="right" sx={NO_WRAP}>
                  {units.format('temperature', surface.condensationBelowOutdoorC)}
                </TableCell>
              </TableRow>
            );
          })}
        </TableBody>
      </Table>
    </Stack>
  );
}

function Breakdown({ estimate, units }: { estimate: HeatingEstimate; units: Units }) {
  const rows = heatLossRows(estimate.heatLoss.components, units);
  return (
    <Stack spacing={1.5}>
      <Box sx={{ overflowX: 'auto' }}>
        <Table size="small" aria-label="Heat loss by part">
          <TableHead>
            <TableRow>
              <TableCell>Part</TableCell>
              <TableCell align="right">Size</TableCell>
              <TableCell align="right">U / F / ACH</TableCell>
              <TableCell align="right">Loss</TableCell>
              <TableCell align="right">Share</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {rows.map((row) => (
              <TableRow key={row.key}>
                <TableCell>
                  {row.label}
                  {row.detail ? (
                    <Typography variant="caption" color="text.secondary" component="div">
                      {row.detail}
                    </Typography>
                  ) : null}
                </TableCell>
                <TableCell align="right" sx={NO_WRAP}>
                  {row.quantity}
                </TableCell>
                <TableCell align="right">{row.coefficient}</TableCell>
                <TableCell align="right" sx={NO_WRAP}>
                  {row.loss}
                </TableCell>
                <TableCell align="right" sx={NO_WRAP}>
                  {row.share}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </Box>
      <HeatLossChart components={estimate.heatLoss.components} />
    </Stack>
  );
}

/**
 * Design-night heating for one house: conditions, heat loss and its parts, the heater verdict,
 * condensation per surface, the assumptions with their sources, and the safety cautions. Follows
 * the house form's unsaved edits (through the stateless route) and a what-if row.
 */
export function HeatingPanel({ house, canRunEstimates, editedHouse = null, editsInvalid = false }: HeatingPanelProps) {
  const units = useUnits();
  const referenceData = useQuery(referenceDataQueryOptions());
  const [whatIf, setWhatIf] = useState<HeatingWhatIfValues>(EMPTY_HEATING_WHAT_IF);
  const settledWhatIf = useDebouncedValue(whatIf, 400);
  const whatIfConditions = useMemo(() => parseHeatingWhatIf(settledWhatIf, units).conditions, [settledWhatIf, units]);

  const stored = useQuery({
    ...storedHeatingEstimateQueryOptions(house.id, house.updatedAt, whatIfConditions),
    enabled: canRunEstimates,
  });
  const storedResult = stored.data && !stored.isPlaceholderData ? stored.data : undefined;
  const edited = useQuery({
    ...editedHeatingEstimateQueryOptions(
      house.id,
      editedHouse ?? houseSpecOf(house),
      storedResult
        ? statelessHeatingConditions(storedResult)
        : { designOutdoorC: 0, elevationM: 0, insideRelativeHumidityPct: 0 },
    ),
    enabled: canRunEstimates && editedHouse !== null && storedResult !== undefined,
  });

  if (!canRunEstimates) {
    return (
      <ResultPanel headingId="heating-panel-heading" title="Heating on the design night">
        <NoPermissionNote what="heating estimates" />
      </ResultPanel>
    );
  }

  const showingEdits = Boolean(editedHouse && edited.data);
  const estimate: HeatingEstimate | undefined = showingEdits ? edited.data : stored.data;
  const spec = editedHouse ?? house;
  const busy = stored.isFetching || edited.isFetching;
  const climateMissing = !stored.data && isMissingClimateError(stored.error);

  return (
    <ResultPanel
      headingId="heating-panel-heading"
      title="Heating on the design night"
      unsavedEdits={Boolean(editedHouse && edited.data)}
      busy={busy}
    >
      <Box sx={{ height: 4 }}>{busy ? <LinearProgress aria-label="Updating the heating estimate" /> : null}</Box>

      {stored.error && !stored.data ? (
        <EstimateError
          error={stored.error}
          farmId={house.farmId}
          what="heating estimates"
          missingClimateHint=", or type a design outdoor temperature below to try one."
        />
      ) : null}
      {edited.error ? <ErrorAlert error={edited.error} title="Your unsaved edits could not be computed" /> : null}
      {editsInvalid ? (
        <Alert severity="info">
          Some fields in the form are not valid: these results are for the last valid values.
        </Alert>
      ) : null}

      <HeatingWhatIf
        values={whatIf}
        onChange={setWhatIf}
        units={units}
        hasCurtain={Boolean(spec.curtainId)}
        placeholders={{
          designOutdoor: stored.data
            ? units.toInput('temperature', stored.data.conditionsUsed.designOutdoorC)
            : undefined,
          insideRelativeHumidityPct: stored.data
            ? String(stored.data.conditionsUsed.insideRelativeHumidityPct)
            : undefined,
        }}
      />

      {!estimate && !stored.error && !climateMissing ? (
        <Typography color="text.secondary" role="status">
          Computing the heating estimate…
        </Typography>
      ) : null}

      {estimate && stored.data ? (
        <>
          <Grid container spacing={2}>
            <Grid size={6}>
              <Figure
                label={`Design outdoor (${sourceWord(stored.data.conditionsSource.designOutdoorC)})`}
                value={units.format('temperature', estimate.heatLoss.outsideC)}
              />
            </Grid>
            <Grid size={6}>
              <Figure
                label={`Inside (${sourceWord(stored.data.conditionsSource.insideC)}${showingEdits ? ', unsaved' : ''})`}
                value={units.format('temperature', estimate.heatLoss.insideC)}
              />
            </Grid>
            <Grid size={6}>
              <Figure
                label={`Inside RH (${sourceWord(stored.data.conditionsSource.insideRelativeHumidityPct)})`}
                value={`${estimate.condensation.insideRelativeHumidityPct} %`}
              />
            </Grid>
            <Grid size={6}>
              <Figure
                label={`Curtain (${sourceWord(stored.data.conditionsSource.curtainClosed)})`}
                value={estimate.heatLoss.curtainApplied ? 'drawn, credited' : 'open'}
              />
            </Grid>
          </Grid>

          <Box>
            <Typography variant="caption" color="text.secondary" component="div">
              Design heat loss (ΔT {units.format('temperatureDifference', estimate.heatLoss.deltaTK)})
            </Typography>
            <Typography variant="h4" component="p" data-testid="heating-total" sx={{ fontSize: '1.6rem' }}>
              {units.format('power', estimate.heatLoss.totalW)}
            </Typography>
          </Box>

          <HeaterVerdict estimate={estimate} units={units} />

          <Accordion defaultExpanded disableGutters>
            <AccordionSummary expandIcon={<ExpandMoreIcon />}>
              <Typography variant="h4" component="h4">
                Where the heat goes
              </Typography>
            </AccordionSummary>
            <AccordionDetails>
              <Breakdown estimate={estimate} units={units} />
            </AccordionDetails>
          </Accordion>

          <Accordion defaultExpanded disableGutters>
            <AccordionSummary expandIcon={<ExpandMoreIcon />}>
              <Typography variant="h4" component="h4">
                Condensation
              </Typography>
            </AccordionSummary>
            <AccordionDetails>
              <CondensationVerdict estimate={estimate} units={units} referenceData={referenceData.data} />
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
                against a primary table: treat the result as a planning range.
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
