import { ToggleButton, ToggleButtonGroup } from '@mui/material';
import type { UnitSystem, User } from '../../../api/types';
import { useUpdateMe } from '../mutations';

/** A compact SI / US switch for the top bar; saves the preference to the user's profile. */
export function UnitSystemToggle({
  user,
  onUpdated,
  color = 'standard',
}: {
  user: User;
  onUpdated: (user: User) => void;
  color?: 'standard' | 'primary' | 'secondary';
}) {
  const updateMe = useUpdateMe({ onSuccess: onUpdated });
  return (
    <ToggleButtonGroup
      size="small"
      exclusive
      color={color}
      value={user.unitSystem}
      aria-label="Units"
      disabled={updateMe.isPending}
      onChange={(_event, value: UnitSystem | null) => {
        if (value && value !== user.unitSystem) updateMe.mutate({ unitSystem: value });
      }}
      sx={{ bgcolor: 'background.paper' }}
    >
      <ToggleButton value="si" aria-label="SI units (metric)">
        SI
      </ToggleButton>
      <ToggleButton value="us" aria-label="US customary units">
        US
      </ToggleButton>
    </ToggleButtonGroup>
  );
}
