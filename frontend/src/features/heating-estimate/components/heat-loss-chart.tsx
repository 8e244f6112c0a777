import { Box } from '@mui/material';
import { useTheme } from '@mui/material/styles';
import { useMemo } from 'react';
import { Bar } from 'react-chartjs-2';
import type { HeatLossComponent } from '../../../api/types';
import '../../../lib/chart';
import { useUnits } from '../../../lib/units';
import { heatLossChartData } from '../heating-chart-data';

/** Horizontal bars: where the design-night heat goes. */
export function HeatLossChart({ components }: { components: HeatLossComponent[] }) {
  const theme = useTheme();
  const units = useUnits();
  const data = useMemo(
    () =>
      heatLossChartData(components, units, {
        covering: theme.palette.secondary.main,
        ground: theme.palette.primary.light,
        air: theme.palette.info.main,
      }),
    [components, units, theme],
  );
  return (
    <Box sx={{ height: 200 }} role="img" aria-label={`Bar chart of the heat loss by part, in ${units.label('power')}`}>
      <Bar
        // The frame around the canvas carries the chart's name and description.
        aria-hidden
        data={data}
        options={{
          indexAxis: 'y',
          responsive: true,
          maintainAspectRatio: false,
          animation: false,
          plugins: { legend: { display: false } },
          scales: { x: { title: { display: true, text: units.label('power') }, beginAtZero: true } },
        }}
      />
    </Box>
  );
}
