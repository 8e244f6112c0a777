import { Alert, AlertTitle, Box } from '@mui/material';
import { useUnits } from '../../../lib/units';

/**
 * The API's cautions for fuel-fired heat (combustion air, venting, carbon monoxide, ethylene;
 * licensed installers and local codes). Shown wherever a fuel quantity is shown.
 */
export function FuelCautions({ cautions }: { cautions: string[] }) {
  const units = useUnits();
  if (cautions.length === 0) return null;
  return (
    <Alert severity="warning" role="note">
      <AlertTitle>Safety</AlertTitle>
      <Box component="ul" sx={{ m: 0, pl: 2 }}>
        {cautions.map((caution) => (
          <li key={caution}>{units.prose(caution)}</li>
        ))}
      </Box>
    </Alert>
  );
}

export function Fact({ label, value, testId }: { label: string; value: string; testId?: string }) {
  return (
    <Box sx={{ minWidth: 120 }}>
      <Box component="div" sx={{ typography: 'caption', color: 'text.secondary' }}>
        {label}
      </Box>
      <Box component="div" sx={{ typography: 'h4' }} data-testid={testId}>
        {value}
      </Box>
    </Box>
  );
}
