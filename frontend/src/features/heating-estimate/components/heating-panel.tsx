import { ExpandMoreIcon } from '../../../components/icons';
import { Accordion, AccordionDetails, AccordionSummary, Alert, Box, LinearProgress, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import type { HeatingEstimate, House, HouseSpec } from '../../../api/types';
import {
  AssumptionList,
  CautionsAlert,
  EstimateError,
  isMissingClimateError,
  NoPermissionNote,
  ResultPanel,
} from '../../../components/estimate-parts';
import { ErrorAlert } from '../../../components/feedback';
import { houseSpecOf } from '../../../lib/house-spec';
import { referenceDataQueryOptions } from '../../../lib/reference-data';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useUnits } from '../../../lib/units';
import {
  editedHeatingEstimateQueryOptions,
  statelessHeatingConditions,
  storedHeatingEstimateQueryOptions,
} from '../queries';
import { CondensationVerdict } from './condensation-verdict';
import { DesignNightFigures } from './design-night-figures';
import { HeatLossBreakdown } from './heat-loss-breakdown';
import { HeaterVerdict } from './heater-verdict';
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
          <DesignNightFigures
            estimate={estimate}
            conditionsSource={stored.data.conditionsSource}
            showingEdits={showingEdits}
            units={units}
          />

          <HeaterVerdict estimate={estimate} units={units} />

          <Accordion defaultExpanded disableGutters>
            <AccordionSummary expandIcon={<ExpandMoreIcon />}>
              <Typography variant="h4" component="h4">
                Where the heat goes
              </Typography>
            </AccordionSummary>
            <AccordionDetails>
              <HeatLossBreakdown estimate={estimate} units={units} />
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
