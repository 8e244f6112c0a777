import {
  Alert,
  AlertTitle,
  Box,
  Paper,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { useTheme } from '@mui/material/styles';
import { Bar } from 'react-chartjs-2';
import type { HouseSeasonEstimate } from '../../../api/types';
import '../../../lib/chart';
import { useUnits } from '../../../lib/units';
import { hourlyVersusDegreeDayText, seasonChartSeries, seasonLossRows } from '../season-chart-data';
import { Fact } from './fuel-cautions';
import { SeasonLampsSummary } from './season-lamps';

/** "2027-01-16T08:00" → "2027-01-16 08:00" */
const readableTime = (localTime: string) => localTime.replace('T', ' ');

export function SeasonResultPanel({ season }: { season: HouseSeasonEstimate }) {
  const units = useUnits();
  const theme = useTheme();
  const series = seasonChartSeries(season, units);
  const fuelUnits = season.fuel;
  const currency = season.inputsUsed.currency;
  return (
    <Paper component="section" aria-labelledby="season-result-heading" sx={{ p: 2, height: '100%' }}>
      <Stack spacing={2}>
        <Typography id="season-result-heading" variant="h3" component="h2">
          Hour-by-hour season
        </Typography>
        <Typography variant="body2" color="text.secondary">
          {season.period.startDate} to {season.period.endDate}: {season.period.heatedDays} of {season.period.days} days
          heated; {season.fuel.label}
          {season.fuel.pricePerUnit === null
            ? ' (no price yet)'
            : ` at ${units.money(season.fuel.pricePerUnit, currency)} per ${season.fuel.priceUnitLabel}`}
          , heater efficiency {units.format('fraction', season.fuel.heaterEfficiency)}.
        </Typography>
        {season.total.hoursBelowSetpoint > 0 ? (
          <Alert severity="warning" data-testid="season-below-setpoint">
            <AlertTitle>The heaters cannot hold the setpoint</AlertTitle>
            {season.heaterCapacity.caution
              ? units.prose(season.heaterCapacity.caution)
              : `${season.total.hoursBelowSetpoint} hours below the setpoint.`}{' '}
            Heat and fuel below count only what the heaters deliver.
          </Alert>
        ) : null}
        <Stack direction="row" spacing={3} useFlexGap sx={{ flexWrap: 'wrap' }}>
          <Fact label="Fuel" value={units.fuel(season.total, fuelUnits)} testId="season-total-fuel" />
          <Fact
            label={`Cost (${currency})`}
            value={season.total.cost === null ? 'needs a fuel price' : units.money(season.total.cost, currency, 0)}
            testId="season-total-cost"
          />
          <Fact label="Heat delivered" value={units.format('energyKWh', season.total.energyKWh)} />
          <Fact label="Heating hours" value={season.total.heatingHours.toLocaleString('en-US')} />
          <Fact
            label={season.peak ? `Peak hour (${readableTime(season.peak.at)})` : 'Peak hour'}
            value={season.peak ? units.format('power', season.peak.heatW) : 'no heat needed'}
          />
        </Stack>
        {season.peak ? (
          <Typography variant="body2" color="text.secondary">
            The peak comes at {units.format('temperature', season.peak.outdoorC)} outdoors.{' '}
            {units.format('fraction', season.nightShareOfHeat)} of the season&apos;s heat is needed at night; the sun
            saves {units.format('energyKWh', season.solarOffsetKWh)}.
          </Typography>
        ) : null}
        <SeasonLampsSummary season={season} />
        <Box sx={{ height: 280 }} role="img" aria-label="Monthly chart of fuel and heat for the season">
          <Bar
            // The frame around the canvas carries the chart's name and description.
            aria-hidden
            data={{
              labels: series.labels,
              datasets: [
                {
                  label: `Fuel (${series.fuelUnitLabel})`,
                  data: series.fuel,
                  backgroundColor: theme.palette.secondary.main,
                  yAxisID: 'fuel',
                },
                {
                  label: `Heat delivered (${series.heatUnitLabel})`,
                  data: series.heat,
                  backgroundColor: theme.palette.primary.light,
                  yAxisID: 'heat',
                },
              ],
            }}
            options={{
              responsive: true,
              maintainAspectRatio: false,
              animation: false,
              plugins: { legend: { position: 'bottom' } },
              scales: {
                fuel: {
                  type: 'linear',
                  position: 'left',
                  beginAtZero: true,
                  title: { display: true, text: series.fuelUnitLabel },
                },
                heat: {
                  type: 'linear',
                  position: 'right',
                  beginAtZero: true,
                  title: { display: true, text: series.heatUnitLabel },
                  grid: { drawOnChartArea: false },
                },
              },
            }}
          />
        </Box>
        <SeasonLossTable season={season} />
        <Table size="small" aria-label="Season by month">
          <TableHead>
            <TableRow>
              <TableCell>Month</TableCell>
              <TableCell align="right">Fuel</TableCell>
              <TableCell align="right">Cost</TableCell>
              <TableCell align="right">Heating hours</TableCell>
              <TableCell align="right">Peak</TableCell>
              <TableCell align="right">Hours below setpoint</TableCell>
              {season.lamps ? (
                <>
                  <TableCell align="right">Lamp electricity</TableCell>
                  <TableCell align="right">Heat saved by lamps</TableCell>
                </>
              ) : null}
            </TableRow>
          </TableHead>
          <TableBody>
            {season.monthly.map((month, index) => (
              <TableRow key={`${month.year}-${month.month}`}>
                <TableCell component="th" scope="row">
                  {series.labels[index]}
                </TableCell>
                <TableCell align="right">{units.fuel(month, fuelUnits)}</TableCell>
                <TableCell align="right">{units.money(month.cost, currency, 0)}</TableCell>
                <TableCell align="right">{month.heatingHours}</TableCell>
                <TableCell align="right">{units.format('power', month.peakW)}</TableCell>
                <TableCell
                  align="right"
                  sx={month.hoursBelowSetpoint > 0 ? { color: 'warning.main', fontWeight: 500 } : undefined}
                >
                  {month.hoursBelowSetpoint}
                </TableCell>
                {season.lamps ? (
                  <>
                    <TableCell align="right">{units.format('energyKWh', month.lampElectricityKWh)}</TableCell>
                    <TableCell align="right">{units.format('energyKWh', month.lampHeatSavedKWh)}</TableCell>
                  </>
                ) : null}
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </Stack>
    </Paper>
  );
}

/** Where the season's heat goes, part by part, the night sky its own row, like the design night's breakdown. */
function SeasonLossTable({ season }: { season: HouseSeasonEstimate }) {
  const units = useUnits();
  const rows = seasonLossRows(season.lossBreakdown, units);
  return (
    <Table size="small" aria-label="Season heat by part" data-testid="season-loss-breakdown">
      <TableHead>
        <TableRow>
          <TableCell>Where the heat goes</TableCell>
          <TableCell align="right">Heat</TableCell>
          <TableCell align="right">Share of the loss</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {rows.map((row) => (
          <TableRow key={row.key} sx={row.key === 'delivered' ? { '& td, & th': { fontWeight: 500 } } : undefined}>
            <TableCell component="th" scope="row">
              {row.label}
            </TableCell>
            <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
              {row.heat}
            </TableCell>
            <TableCell align="right">{row.share}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}

/**
 * The API's sentences, minus any that quote SI energy figures (those are shown above in the
 * user's units).
 */
/** The degree-day figure beside the hourly one, the gap taken apart effect by effect, in words. */
export function DegreeDayPanel({ season }: { season: HouseSeasonEstimate }) {
  const units = useUnits();
  const degreeDays = season.degreeDays;
  return (
    <Paper component="section" aria-labelledby="degree-day-heading" sx={{ p: 2, height: '100%' }}>
      <Stack spacing={2}>
        <Typography id="degree-day-heading" variant="h3" component="h2">
          Degree-day cross-check
        </Typography>
        <Stack direction="row" spacing={3} useFlexGap sx={{ flexWrap: 'wrap' }}>
          <Fact label="Degree-days" value={units.format('degreeDays', degreeDays.degreeDaysKDay)} />
          <Fact label="Fuel (degree-day)" value={units.fuel(degreeDays, season.fuel)} />
          <Fact label="Cost (degree-day)" value={units.money(degreeDays.cost, season.inputsUsed.currency, 0)} />
        </Stack>
        <Typography variant="body2">Base: {units.prose(degreeDays.baseDescription)}.</Typography>
        <ConventionalBase season={season} />
        <Typography variant="body1" sx={{ fontWeight: 500 }} data-testid="degree-day-difference">
          {hourlyVersusDegreeDayText(degreeDays)}
        </Typography>
        <Table size="small" aria-label="From the degree-day figure to the hourly one">
          <TableHead>
            <TableRow>
              <TableCell>Step</TableCell>
              <TableCell align="right">Heat ({units.label('energyKWh')})</TableCell>
              <TableCell align="right">Change</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {degreeDays.steps.map((step) => (
              <TableRow key={step.key}>
                <TableCell>{step.label}</TableCell>
                <TableCell align="right">{units.format('energyKWh', step.energyKWh, { withoutUnit: true })}</TableCell>
                <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                  {step.changeKWh === 0
                    ? '—'
                    : `${step.changeKWh > 0 ? '+' : '−'}${units.format('energyKWh', Math.abs(step.changeKWh), { withoutUnit: true })}`}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
        <Box component="ul" sx={{ m: 0, pl: 2.5, '& li': { mb: 0.5 } }}>
          {degreeDays.explanation.map((sentence) => (
            <Typography component="li" variant="body2" key={sentence}>
              {units.prose(sentence)}
            </Typography>
          ))}
        </Box>
      </Stack>
    </Paper>
  );
}

/** The same degree-day method to the conventional 65 °F (18.3 °C) base, beside the setpoint base. */
function ConventionalBase({ season }: { season: HouseSeasonEstimate }) {
  const units = useUnits();
  const conventional = season.degreeDays.conventionalBase;
  return (
    <Stack spacing={1} data-testid="degree-day-conventional-base">
      <Stack direction="row" spacing={3} useFlexGap sx={{ flexWrap: 'wrap' }}>
        <Fact
          label={`Degree-days to ${units.format('temperature', conventional.baseTemperatureC)}`}
          value={units.format('degreeDays', conventional.degreeDaysKDay)}
        />
        <Fact label="Fuel at that base" value={units.fuel(conventional, season.fuel)} />
        <Fact label="Heat at that base" value={units.format('energyKWh', conventional.energyKWh)} />
      </Stack>
      <Typography variant="body2" color="text.secondary">
        {units.prose(conventional.note)}
      </Typography>
    </Stack>
  );
}
