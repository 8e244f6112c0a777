import { Box, Typography } from '@mui/material';
import { useTheme } from '@mui/material/styles';
import { useQuery } from '@tanstack/react-query';
import { useId, useMemo } from 'react';
import { Line } from 'react-chartjs-2';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import '../../../lib/chart';
import { useUnits } from '../../../lib/units';
import { logChartSeries, logSummary } from '../log-chart-data';
import { temperatureLogDetailQueryOptions } from '../queries';

/** Daily minimum, mean and maximum of one stored log. */
export function TemperatureLogChart({ logId }: { logId: number }) {
  const units = useUnits();
  const theme = useTheme();
  const log = useQuery(temperatureLogDetailQueryOptions(logId));
  const series = useMemo(() => (log.data ? logChartSeries(log.data.days, units) : null), [log.data, units]);
  const summaryId = useId();
  if (log.isPending) return <LoadingState label="Loading the log…" />;
  if (log.isError) return <ErrorAlert error={log.error} title="The log could not be loaded" />;
  if (!series) return null;
  const lines = [
    { label: 'Daily maximum', data: series.maximum, color: theme.palette.secondary.main },
    { label: 'Daily mean', data: series.mean, color: theme.palette.primary.main },
    { label: 'Daily minimum', data: series.minimum, color: theme.palette.info.main },
  ];
  return (
    <Box>
      <Typography variant="h4" component="h3" gutterBottom>
        {log.data.name}: {log.data.startDate} to {log.data.endDate}
      </Typography>
      <Box
        sx={{ height: 260 }}
        role="img"
        aria-label={`Chart of the daily temperatures of ${log.data.name} in ${series.unitLabel}`}
        aria-describedby={summaryId}
      >
        <Line
          // The frame around the canvas carries the chart's name and description.
          aria-hidden
          data={{
            labels: series.labels,
            datasets: lines.map((line) => ({
              label: `${line.label} (${series.unitLabel})`,
              data: line.data,
              borderColor: line.color,
              backgroundColor: line.color,
              pointRadius: series.labels.length > 60 ? 0 : 2,
              spanGaps: true,
            })),
          }}
          options={{
            responsive: true,
            maintainAspectRatio: false,
            animation: false,
            plugins: { legend: { position: 'bottom' } },
            scales: { y: { title: { display: true, text: series.unitLabel } } },
          }}
        />
      </Box>
      <Typography id={summaryId} variant="body2" color="text.secondary" sx={{ mt: 1 }}>
        {logSummary(log.data.days, (celsius) => units.format('temperature', celsius))}
      </Typography>
    </Box>
  );
}
