import { Alert, Grid, Stack, Typography } from '@mui/material';
import type { HeatingEstimate } from '../../../api/types';
import { Figure } from '../../../components/estimate-parts';
import type { Units } from '../../../lib/units';
import { minimumUnitCount } from '../heating-display';

/** Heater verdict: adequate or short, what is installed against what is needed, and what one failure costs. */
export function HeaterVerdict({ estimate, units }: { estimate: HeatingEstimate; units: Units }) {
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
      {estimate.lamps ? (
        <Typography variant="body2" color="text.secondary" data-testid="heater-lamps-note">
          The supplemental lamps give {units.format('power', estimate.lamps.heatW)} of heat while they run (
          {units.format('fraction', estimate.lamps.shareOfDesignLoss)} of the design loss), but the heaters are sized
          without it: lamps may be off on the coldest night.
        </Typography>
      ) : null}
    </Stack>
  );
}
