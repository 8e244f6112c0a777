import { Box, Chip, Stack, Typography } from '@mui/material';
import type { Farm } from '../../../api/types';
import { useUnits } from '../../../lib/units';

/** The farm's site facts, in the user's units. */
export function FarmSummary({ farm }: { farm: Farm }) {
  const units = useUnits();
  const facts: [string, string][] = [
    ['Latitude', `${farm.latitudeDeg.toFixed(4)}°`],
    ['Longitude', `${farm.longitudeDeg.toFixed(4)}°`],
    ['Elevation', units.format('length', farm.elevationM, { decimals: 0 })],
    ['Time zone', farm.timeZone],
    ['Currency', farm.currency],
  ];
  return (
    <Stack direction="row" spacing={3} useFlexGap sx={{ flexWrap: 'wrap', alignItems: 'center' }}>
      <Chip label={`My role: ${farm.myRole}`} color="secondary" size="small" />
      {facts.map(([label, value]) => (
        <Box key={label}>
          <Typography variant="caption" color="text.secondary" component="div">
            {label}
          </Typography>
          <Typography variant="body2">{value}</Typography>
        </Box>
      ))}
    </Stack>
  );
}
