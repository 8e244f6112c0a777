import { Alert } from '@mui/material';
import type { CoolingEstimate } from '../../../api/types';
import type { Units } from '../../../lib/units';

/** Installed against required exhaust: adequate, short (with the fans needed) or none entered. */
export function FanVerdict({ estimate, units }: { estimate: CoolingEstimate; units: Units }) {
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
