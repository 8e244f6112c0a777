import { Box, Paper, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import type { House, HouseSpec } from '../../../api/types';
import { houseSpecOf } from '../../../lib/house-spec';
import { useUnits } from '../../../lib/units';
import {
  editedHeatingEstimateQueryOptions,
  statelessHeatingConditions,
  storedHeatingEstimateQueryOptions,
} from '../queries';

const VERDICT_WORDS = { adequate: 'enough', short: 'short', 'none-installed': 'none entered' } as const;

/**
 * One line that stays in sight while the form scrolls (on a phone above all): the design-night
 * loss, whether the heaters hold it, and whether any covering drips. Follows the unsaved edits.
 */
export function HeatingSummaryBar({
  house,
  editedHouse,
  canRunEstimates,
}: {
  house: House;
  editedHouse: HouseSpec | null;
  canRunEstimates: boolean;
}) {
  const units = useUnits();
  const stored = useQuery({
    ...storedHeatingEstimateQueryOptions(house.id, house.updatedAt, {}),
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
  if (!canRunEstimates) return null;
  const estimate = editedHouse ? edited.data : storedResult;
  const verdict = estimate?.heater.verdict;
  const drips = estimate?.condensation.anyCondenses;
  return (
    <Paper
      role="region"
      aria-label="Design-night summary"
      elevation={3}
      className="no-print"
      sx={{
        position: 'sticky',
        top: { xs: 56, sm: 64 },
        zIndex: 2,
        px: 2,
        py: 1,
        display: 'flex',
        flexWrap: 'wrap',
        columnGap: 2,
        rowGap: 0.5,
        alignItems: 'baseline',
      }}
    >
      <Typography variant="body2" sx={{ fontWeight: 600 }}>
        {editedHouse ? 'With your edits:' : 'Design night:'}
      </Typography>
      {estimate ? (
        <>
          <Box component="span" data-testid="summary-loss">
            Loss {units.format('power', estimate.heatLoss.totalW)}
          </Box>
          <Box
            component="span"
            data-testid="summary-heaters"
            sx={{ color: verdict === 'adequate' ? 'success.dark' : 'error.main', fontWeight: 600 }}
          >
            Heaters {verdict ? VERDICT_WORDS[verdict] : '—'}
          </Box>
          <Box component="span" data-testid="summary-drips" sx={{ color: drips ? 'warning.dark' : 'success.dark' }}>
            {drips ? 'Drips' : 'Dry'}
          </Box>
        </>
      ) : (
        <Typography variant="body2" color="text.secondary">
          {stored.isError ? 'no estimate (see the heating panel)' : 'computing…'}
        </Typography>
      )}
    </Paper>
  );
}
