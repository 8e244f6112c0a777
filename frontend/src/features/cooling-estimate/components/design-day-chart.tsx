import { Box } from '@mui/material';
import { useTheme } from '@mui/material/styles';
import { useMemo } from 'react';
import { Line } from 'react-chartjs-2';
import type { DesignDayHour } from '../../../api/types';
import '../../../lib/chart';
import { useUnits } from '../../../lib/units';
import { designDayChartData } from '../cooling-chart-data';

/** Outdoor and indoor temperature through the design day, with the cooling setpoint. */
export function DesignDayChart({ hours, coolingSetpointC }: { hours: DesignDayHour[]; coolingSetpointC: number }) {
  const theme = useTheme();
  const units = useUnits();
  const data = useMemo(
    () =>
      designDayChartData(hours, coolingSetpointC, units, {
        outdoor: theme.palette.text.secondary,
        fans: theme.palette.secondary.dark,
        pads: theme.palette.info.main,
        setpoint: theme.palette.error.main,
      }),
    [hours, coolingSetpointC, units, theme],
  );
  return (
    <Box
      sx={{ height: 260 }}
      role="img"
      aria-label={`Line chart of outdoor and indoor temperature through the design day, in ${units.label('temperature')}`}
    >
      <Line
        // The frame around the canvas carries the chart's name and description.
        aria-hidden
        data={data}
        options={{
          responsive: true,
          maintainAspectRatio: false,
          animation: false,
          plugins: { legend: { position: 'bottom', labels: { boxWidth: 12 } } },
          scales: {
            x: { title: { display: true, text: 'Solar time' } },
            y: { title: { display: true, text: units.label('temperature') } },
          },
        }}
      />
    </Box>
  );
}
