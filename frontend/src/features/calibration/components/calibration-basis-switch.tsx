import { Stack, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router-dom';
import type { HeatLossBasis } from '../../../api/types';
import { calibrationsQueryOptions } from '../queries';

/** The heat-loss basis chosen on a page, kept in the URL (?basis=calibrated) so a reload keeps it. */
export function useHeatLossBasisParam(): [HeatLossBasis, (basis: HeatLossBasis) => void] {
  const [search, setSearch] = useSearchParams();
  const basis: HeatLossBasis = search.get('basis') === 'calibrated' ? 'calibrated' : 'handbook';
  const setBasis = (next: HeatLossBasis) =>
    setSearch(
      (current) => {
        const params = new URLSearchParams(current);
        if (next === 'calibrated') params.set('basis', 'calibrated');
        else params.delete('basis');
        return params;
      },
      { replace: true, preventScrollReset: true },
    );
  return [basis, setBasis];
}

/** "From the handbook" or "As calibrated" against the farm's fuel bills. */
export function CalibrationBasisSwitch({
  farmId,
  value,
  onChange,
}: {
  farmId: number;
  value: HeatLossBasis;
  onChange: (basis: HeatLossBasis) => void;
}) {
  const calibrations = useQuery(calibrationsQueryOptions(farmId));
  const newest = calibrations.data?.[0];
  return (
    <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
      <ToggleButtonGroup
        exclusive
        size="small"
        value={value}
        aria-label="Heat loss"
        onChange={(_event, next: HeatLossBasis | null) => {
          if (next) onChange(next);
        }}
      >
        <ToggleButton value="handbook">From the handbook</ToggleButton>
        <ToggleButton value="calibrated" disabled={!newest && value !== 'calibrated'}>
          As calibrated
        </ToggleButton>
      </ToggleButtonGroup>
      <Typography variant="body2" color="text.secondary">
        {newest
          ? `As calibrated: heat loss × each house's factor from its fuel bills (calibration of ${newest.createdAt.slice(0, 10)}).`
          : 'No calibration yet: enter the fuel bills and run the calibration on the fuel bills page.'}
      </Typography>
    </Stack>
  );
}
