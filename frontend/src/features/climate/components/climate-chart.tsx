import { Box } from '@mui/material';
import { useTheme } from '@mui/material/styles';
import { useMemo } from 'react';
import { Line } from 'react-chartjs-2';
import '../../../lib/chart';
import type { ClimateChartSeries } from '../climate-chart-data';

/** Mean daily minimum and maximum per month, in the user's temperature unit. */
export function ClimateChart({ series, unitLabel }: { series: ClimateChartSeries; unitLabel: string }) {
  const theme = useTheme();
  const data = useMemo(
    () => ({
      labels: series.labels,
      datasets: [
        {
          label: `Mean daily maximum (${unitLabel})`,
          data: series.maximum,
          borderColor: theme.palette.secondary.main,
          backgroundColor: theme.palette.secondary.main,
          tension: 0.3,
          spanGaps: true,
        },
        {
          label: `Mean daily minimum (${unitLabel})`,
          data: series.minimum,
          borderColor: theme.palette.info.main,
          backgroundColor: theme.palette.info.main,
          tension: 0.3,
          spanGaps: true,
        },
      ],
    }),
    [series, unitLabel, theme],
  );
  return (
    <Box
      sx={{ height: 260 }}
      role="img"
      aria-label={`Chart of the monthly mean daily minimum and maximum in ${unitLabel}`}
    >
      <Line
        // The frame around the canvas carries the chart's name and description.
        aria-hidden
        data={data}
        options={{
          responsive: true,
          maintainAspectRatio: false,
          animation: false,
          plugins: { legend: { position: 'bottom' } },
          scales: { y: { title: { display: true, text: unitLabel } } },
        }}
      />
    </Box>
  );
}
