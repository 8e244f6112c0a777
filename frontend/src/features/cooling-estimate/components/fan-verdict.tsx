import { Alert } from '@mui/material';
import type { CoolingEstimate } from '../../../api/types';
import type { Units } from '../../../lib/units';

/** Installed against required exhaust: adequate, short (with the fans needed) or none entered. */
export function FanVerdict({ estimate, units }: { estimate: CoolingEstimate; units: Units }) {
  const capacity = estimate.capacity;
  const installed = units.format('airFlow', capacity.installedFlowM3PerS);
  const required = units.format('airFlow', capacity.requiredFlowM3PerS);
  const lamps = estimate.lamps;
  const lampsSentence = !lamps
    ? null
    : lamps.addedFlowM3PerS > 0
      ? ` With the supplemental lamps (${units.format('power', lamps.heatW)} of heat while they run) the requirement is set at solar hour ${lamps.governingHour}: they add ${units.format('airFlow', lamps.addedFlowM3PerS)}.`
      : ` The supplemental lamps (${units.format('power', lamps.heatW)} of heat while they run) warm the hours before sunrise but add nothing to the requirement, which the sunniest hour sets.`;
  if (capacity.verdict === 'adequate') {
    return (
      <Alert severity="success" data-testid="fan-verdict">
        <strong>Fans are adequate.</strong> {installed} installed covers the {required} required.
        {lampsSentence}
      </Alert>
    );
  }
  if (capacity.verdict === 'no-fans') {
    return (
      <Alert severity="error" data-testid="fan-verdict">
        <strong>No exhaust fans entered.</strong> The house needs {required} of exhaust.
        {lampsSentence}
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
      {lampsSentence}
    </Alert>
  );
}
