import {
  Alert,
  AlertTitle,
  Box,
  Chip,
  Paper,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { useTheme } from '@mui/material/styles';
import { useId } from 'react';
import { Bar } from 'react-chartjs-2';
import type { Calibration, CalibrationMeter } from '../../../api/types';
import '../../../lib/chart';
import {
  factorWithInterval,
  meterChartSeries,
  meterChartSummary,
  periodLabel,
  verdictLabel,
} from '../calibration-values';

const number = (value: number | null) =>
  value === null ? '—' : new Intl.NumberFormat('en-US', { maximumFractionDigits: value >= 100 ? 0 : 1 }).format(value);
const percent = (value: number | null) => (value === null ? '—' : `${value.toFixed(1)} %`);

function MeterChart({ meter }: { meter: CalibrationMeter }) {
  const theme = useTheme();
  const summaryId = useId();
  const series = meterChartSeries(meter);
  const datasets = [
    { label: `Billed (${series.unit})`, data: series.billed, color: theme.palette.text.primary },
    { label: `Model, handbook (${series.unit})`, data: series.handbook, color: theme.palette.grey[500] },
    ...(meter.fitted
      ? [{ label: `Model, calibrated (${series.unit})`, data: series.fitted, color: theme.palette.primary.main }]
      : []),
  ];
  return (
    <Box>
      <Box
        sx={{ height: 260 }}
        role="img"
        aria-label={`Chart of billed and modelled fuel per bill for ${meter.houseNames.join(' and ')}`}
        aria-describedby={summaryId}
      >
        <Bar
          aria-hidden
          data={{
            labels: series.labels,
            datasets: datasets.map((set) => ({
              label: set.label,
              data: set.data,
              backgroundColor: set.color,
              borderColor: set.color,
            })),
          }}
          options={{
            responsive: true,
            maintainAspectRatio: false,
            animation: false,
            plugins: { legend: { position: 'bottom' } },
            scales: { y: { title: { display: true, text: series.unit } } },
          }}
        />
      </Box>
      <Typography id={summaryId} variant="body2" color="text.secondary" sx={{ mt: 1 }}>
        {meterChartSummary(meter)}
      </Typography>
    </Box>
  );
}

function MeterResult({ meter }: { meter: CalibrationMeter }) {
  const verdict = verdictLabel(meter);
  const headingId = useId();
  return (
    <Paper component="section" variant="outlined" aria-labelledby={headingId} sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Stack direction="row" spacing={2} useFlexGap sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
          <Typography id={headingId} variant="h3" sx={{ flexGrow: 1 }}>
            {meter.fuelLabel}: {meter.houseNames.join(', ')}
          </Typography>
          <Chip color={verdict.severity} label={verdict.label} />
        </Stack>
        {meter.fitted ? (
          <>
            <Typography>
              Heat-loss factor: <strong data-testid={`factor-${meter.key}`}>{factorWithInterval(meter)}</strong>
            </Typography>
            <Typography>{meter.meaning}</Typography>
            <Alert severity={verdict.severity === 'success' ? 'success' : 'warning'} role="note">
              <AlertTitle>Fit against the bills</AlertTitle>
              {meter.verdict}
            </Alert>
            <Typography variant="body2" color="text.secondary">
              NMBE {percent(meter.nmbePercent)}, CV(RMSE) {percent(meter.cvRmsePercent)} (ASHRAE Guideline 14, one
              fitted parameter; limits for monthly data ±5 % and 15 %).
            </Typography>
          </>
        ) : (
          <Alert severity="info">{meter.refusal}</Alert>
        )}
        <TableContainer>
          <Table size="small" aria-label={`Billed and modelled fuel, ${meter.houseNames.join(', ')}`}>
            <TableHead>
              <TableRow>
                <TableCell>Period</TableCell>
                <TableCell align="right">Days</TableCell>
                <TableCell>Temperatures</TableCell>
                <TableCell align="right">Billed</TableCell>
                <TableCell align="right">Model, handbook</TableCell>
                <TableCell align="right">Model, calibrated</TableCell>
                <TableCell>Unit</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {meter.periods.map((period) => (
                <TableRow key={period.recordId}>
                  <TableCell>
                    {periodLabel(period)}
                    {period.note ? (
                      <Typography variant="caption" component="div" color="text.secondary">
                        {period.note}
                      </Typography>
                    ) : null}
                  </TableCell>
                  <TableCell align="right">{period.days}</TableCell>
                  <TableCell>
                    {period.climateFrom === 'temperature-log'
                      ? `Log${period.temperatureLogName ? `: ${period.temperatureLogName}` : ''}`
                      : 'Normals (no log covers it)'}
                  </TableCell>
                  <TableCell align="right">{number(period.billedQuantity)}</TableCell>
                  <TableCell align="right">{number(period.handbookQuantity)}</TableCell>
                  <TableCell align="right">{number(period.fittedQuantity)}</TableCell>
                  <TableCell>{period.quantityUnit}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
        <MeterChart meter={meter} />
      </Stack>
    </Paper>
  );
}

/** The newest calibration: per meter the factor, the fit and the bills against the model. */
export function CalibrationResults({ calibration }: { calibration: Calibration }) {
  return (
    <Stack spacing={2}>
      <Typography variant="body2" color="text.secondary">
        Calibrated on {new Date(calibration.createdAt).toLocaleString('en-US')} from {calibration.recordCount} bills.
        Estimates “as calibrated” use this run until you run it again.
      </Typography>
      {calibration.meters.map((meter) => (
        <MeterResult key={meter.key} meter={meter} />
      ))}
      <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
        {calibration.notes.map((note) => (
          <Typography component="li" variant="body2" color="text.secondary" key={note}>
            {note}
          </Typography>
        ))}
      </Box>
    </Stack>
  );
}
