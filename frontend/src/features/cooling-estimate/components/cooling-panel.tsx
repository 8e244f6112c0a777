import { ExpandMoreIcon } from '../../../components/icons';
import {
  Accordion,
  AccordionDetails,
  AccordionSummary,
  Alert,
  Box,
  Grid,
  LinearProgress,
  Stack,
  Typography,
} from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import type { CoolingEstimate, House, HouseSpec } from '../../../api/types';
import {
  AssumptionList,
  CautionsAlert,
  EstimateError,
  Figure,
  NoPermissionNote,
  ResultPanel,
} from '../../../components/estimate-parts';
import { ErrorAlert } from '../../../components/feedback';
import { houseSpecOf } from '../../../lib/house-spec';
import { referenceDataQueryOptions } from '../../../lib/reference-data';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useUnits } from '../../../lib/units';
import { hourRanges } from '../cooling-chart-data';
import { editedCoolingEstimateQueryOptions, storedCoolingEstimateQueryOptions } from '../queries';
import { AirExchangeFigures } from './air-exchange-figures';
import { CapacityFactors } from './capacity-factors';
import { DesignDayChart } from './design-day-chart';
import { FanStaging } from './fan-staging';
import { FanVerdict } from './fan-verdict';
import { PadsResult } from './pads-result';
import { EMPTY_PAD_WHAT_IF, PadWhatIf, parsePadWhatIf, type PadWhatIfValues } from './pad-what-if';
import { SummerDesignFigures } from './summer-design-figures';
import { WinterFanStage } from './winter-fan-stage';

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
          <SummerDesignFigures
            conditionsUsed={stored.data.conditionsUsed}
            conditionsSource={stored.data.conditionsSource}
            designDay={estimate.designDay}
            units={units}
          />

          <FanVerdict estimate={estimate} units={units} />

          <AirExchangeFigures estimate={estimate} floorAreaM2={floorAreaM2} units={units} />

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
              <CapacityFactors estimate={estimate} units={units} />
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
              <FanStaging staging={estimate.staging} units={units} />
            </AccordionDetails>
          </Accordion>

          <Accordion disableGutters>
            <AccordionSummary expandIcon={<ExpandMoreIcon />}>
              <Typography variant="h4" component="h4">
                Winter fan stage
              </Typography>
            </AccordionSummary>
            <AccordionDetails>
              <WinterFanStage winterVentilation={estimate.winterVentilation} units={units} />
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
