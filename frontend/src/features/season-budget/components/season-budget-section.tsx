import { DownloadIcon } from '../../../components/icons';
import {
  Alert,
  AlertTitle,
  Box,
  Button,
  Paper,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableFooter,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { useTheme } from '@mui/material/styles';
import { useMutation, useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Bar } from 'react-chartjs-2';
import type { HeatLossBasis, SeasonBudget } from '../../../api/types';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import '../../../lib/chart';
import { saveBlob } from '../../../lib/save-blob';
import { useUnits, type Units } from '../../../lib/units';
import { budgetChartSeries } from '../budget-chart-data';
import { downloadSeasonBudgetCsv, seasonBudgetQueryOptions } from '../queries';

const SEASON_FROM: Record<SeasonBudget['seasonFrom'], string> = {
  request: 'the dates asked for',
  'default-heating-season': 'the heating season',
  'temperature-log': 'the days the temperature log covers',
};

function BudgetChart({ budget, units }: { budget: SeasonBudget; units: Units }) {
  const theme = useTheme();
  const series = budgetChartSeries(budget, units);
  return (
    <Box sx={{ height: 280 }} role="img" aria-label="Bar chart of the farm's fuel cost and heat per month">
      <Bar
        // The frame around the canvas carries the chart's name and description.
        aria-hidden
        data={{
          labels: series.labels,
          datasets: [
            {
              label: 'Fuel cost',
              data: series.cost,
              backgroundColor: theme.palette.secondary.main,
              yAxisID: 'cost',
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
            cost: {
              type: 'linear',
              position: 'left',
              title: { display: true, text: `Cost (${budget.currency})` },
              beginAtZero: true,
            },
            heat: {
              type: 'linear',
              position: 'right',
              title: { display: true, text: series.heatUnitLabel },
              beginAtZero: true,
              grid: { drawOnChartArea: false },
            },
          },
        }}
      />
    </Box>
  );
}

/** Fuels burnt by some house that the farm has no price for, once each. */
export function unpricedFuels(budget: SeasonBudget): MissingPriceFuel[] {
  const fuels = new Map<string, MissingPriceFuel>();
  for (const house of budget.houses) {
    if (house.fuelId && house.pricePerUnit === null && house.unitSi && house.unitUs) {
      fuels.set(house.fuelId, {
        fuelId: house.fuelId,
        label: house.fuelLabel ?? house.fuelId,
        unitSi: house.unitSi,
        unitUs: house.unitUs,
      });
    }
  }
  return [...fuels.values()];
}

export interface MissingPriceFuel {
  fuelId: string;
  label: string;
  unitSi: string;
  unitUs: string;
}

function BudgetTable({ budget, units }: { budget: SeasonBudget; units: Units }) {
  const currency = budget.currency;
  return (
    <TableContainer>
      <Table size="small" aria-label="Season fuel budget per house">
        <TableHead>
          <TableRow>
            <TableCell>House</TableCell>
            <TableCell>Fuel</TableCell>
            <TableCell align="right">Heated days</TableCell>
            <TableCell align="right">Heat delivered</TableCell>
            <TableCell align="right">Fuel</TableCell>
            <TableCell align="right">Cost ({currency})</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {budget.houses.map((house) => (
            <TableRow key={house.houseId}>
              <TableCell component="th" scope="row">
                {house.name}
                {house.problem ? (
                  <Typography variant="caption" color="warning.main" component="div">
                    {units.prose(house.problem)}
                  </Typography>
                ) : null}
                {house.hoursBelowSetpoint > 0 ? (
                  <Typography
                    variant="caption"
                    color="warning.main"
                    component="div"
                    title={house.capacityCaution ? units.prose(house.capacityCaution) : undefined}
                  >
                    {house.hoursBelowSetpoint} h below setpoint: heaters too small (
                    {units.format('energyKWh', house.unmetHeatKWh)} not delivered)
                  </Typography>
                ) : null}
              </TableCell>
              <TableCell>{house.fuelLabel ?? '—'}</TableCell>
              <TableCell align="right">{house.heatedDays}</TableCell>
              <TableCell align="right">{units.format('energyKWh', house.energyKWh)}</TableCell>
              <TableCell align="right">
                {house.unitSi && house.unitUs ? units.fuel(house, { unitSi: house.unitSi, unitUs: house.unitUs }) : '—'}
              </TableCell>
              <TableCell align="right">{units.money(house.cost, currency, 0)}</TableCell>
            </TableRow>
          ))}
        </TableBody>
        <TableFooter sx={{ '& td, & th': { color: 'text.primary', fontSize: 'body2.fontSize' } }}>
          {budget.byFuel.map((fuel) => (
            <TableRow key={fuel.fuelId}>
              <TableCell component="th" scope="row" colSpan={3}>
                {fuel.label}: {fuel.houseCount} {fuel.houseCount === 1 ? 'house' : 'houses'}
              </TableCell>
              <TableCell align="right">{units.format('energyKWh', fuel.energyKWh)}</TableCell>
              <TableCell align="right">{units.fuel(fuel, fuel)}</TableCell>
              <TableCell align="right">{units.money(fuel.cost, currency, 0)}</TableCell>
            </TableRow>
          ))}
          <TableRow>
            <TableCell component="th" scope="row" colSpan={3} sx={{ fontWeight: 700, color: 'text.primary' }}>
              Farm total
            </TableCell>
            <TableCell align="right" sx={{ fontWeight: 700, color: 'text.primary' }}>
              {units.format('energyKWh', budget.totalEnergyKWh)}
            </TableCell>
            <TableCell />
            <TableCell align="right" sx={{ fontWeight: 700, color: 'text.primary' }} aria-label="Farm total cost">
              {units.money(budget.totalCost, currency, 0)}
            </TableCell>
          </TableRow>
        </TableFooter>
      </Table>
    </TableContainer>
  );
}

/** The farm's season: fuel and cost of every house, the total, by month, with a CSV export. */
export function SeasonBudgetSection({
  farmId,
  heatLossBasis,
  renderMissingPrice,
}: {
  farmId: number;
  heatLossBasis?: HeatLossBasis;
  /** asks for the farm's price of a fuel it has none for (the page supplies the form) */
  renderMissingPrice?: (fuel: MissingPriceFuel) => ReactNode;
}) {
  const units = useUnits();
  const budget = useQuery(seasonBudgetQueryOptions(farmId, heatLossBasis === 'calibrated' ? { heatLossBasis } : {}));
  const exportCsv = useMutation({
    mutationFn: async () => {
      const file = await downloadSeasonBudgetCsv(farmId, units.system, heatLossBasis);
      saveBlob(file.blob, file.fileName);
    },
  });

  return (
    <Paper component="section" aria-labelledby="season-budget-heading" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
          <Typography id="season-budget-heading" variant="h2" sx={{ flexGrow: 1 }}>
            Season fuel budget
          </Typography>
          <Button
            variant="outlined"
            startIcon={<DownloadIcon />}
            onClick={() => exportCsv.mutate()}
            disabled={exportCsv.isPending || !budget.data}
          >
            Export CSV ({units.system === 'us' ? 'US units' : 'SI units'})
          </Button>
        </Stack>
        <ErrorAlert error={exportCsv.error} title="The CSV could not be downloaded" />
        {budget.isPending ? <LoadingState label="Computing the season for every house…" /> : null}
        <ErrorAlert error={budget.error} title="The season budget could not be computed" />
        {budget.data ? (
          <>
            <Typography variant="body2" color="text.secondary">
              {budget.data.startDate} to {budget.data.endDate} ({SEASON_FROM[budget.data.seasonFrom]}), from the
              farm&apos;s {budget.data.climateSource === 'normals' ? 'climate normals' : 'temperature log'}. Costs are
              in {budget.data.currency}.
            </Typography>
            <Typography variant="body2" data-testid="budget-heat-loss-basis">
              {budget.data.heatLossBasisStatement}
            </Typography>
            <Stack direction="row" spacing={4} useFlexGap sx={{ flexWrap: 'wrap' }}>
              <Box>
                <Typography variant="caption" color="text.secondary" component="div">
                  Season cost, all houses
                </Typography>
                <Typography variant="h3" component="p" data-testid="farm-season-cost">
                  {budget.data.totalCost === null
                    ? 'needs fuel prices'
                    : units.money(budget.data.totalCost, budget.data.currency, 0)}
                </Typography>
              </Box>
              <Box>
                <Typography variant="caption" color="text.secondary" component="div">
                  Heat delivered
                </Typography>
                <Typography variant="h3" component="p">
                  {units.format('energyKWh', budget.data.totalEnergyKWh)}
                </Typography>
              </Box>
            </Stack>
            {!budget.data.costComplete ? (
              <Alert severity="warning">
                Some houses have no fuel price or no heaters and are left out of the total cost; their heat and fuel are
                shown.
              </Alert>
            ) : null}
            {unpricedFuels(budget.data).map((fuel) => (
              <Box key={fuel.fuelId}>{renderMissingPrice?.(fuel)}</Box>
            ))}
            <BudgetTable budget={budget.data} units={units} />
            <BudgetChart budget={budget.data} units={units} />
            {budget.data.notes.length > 0 ? (
              <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
                {budget.data.notes
                  .filter((note) => note !== budget.data.heatLossBasisStatement)
                  .map((note) => (
                    <Typography component="li" variant="body2" color="text.secondary" key={note}>
                      {units.prose(note)}
                    </Typography>
                  ))}
              </Box>
            ) : null}
            {budget.data.cautions.length > 0 ? (
              <Alert severity="warning" role="note">
                <AlertTitle>Safety</AlertTitle>
                <Box component="ul" sx={{ m: 0, pl: 2 }}>
                  {budget.data.cautions.map((caution) => (
                    <li key={caution}>{units.prose(caution)}</li>
                  ))}
                </Box>
              </Alert>
            ) : null}
          </>
        ) : null}
      </Stack>
    </Paper>
  );
}
