import { DownloadIcon, PrintIcon } from '../../../components/icons';
import {
  Alert,
  Box,
  Button,
  Grid,
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
import { useMemo } from 'react';
import { Bar } from 'react-chartjs-2';
import type { SideBySide } from '../../../api/types';
import '../../../lib/chart';
import { saveBlob } from '../../../lib/save-blob';
import { useUnits } from '../../../lib/units';
import { sideBySideChartData, sideBySideCsv, sideBySideRows } from '../side-by-side-rows';
import { alternativeChangesSentence } from '../changed-fields';

/** The first column stays in view while the table scrolls sideways inside its card. */
const STICKY_FIRST = {
  position: 'sticky',
  left: 0,
  zIndex: 1,
  bgcolor: 'background.paper',
  minWidth: 150,
  maxWidth: 200,
} as const;

/** The house and its alternatives in columns: every row a quantity, with each alternative's difference. */
export function SideBySideView({ data, fileName }: { data: SideBySide; fileName: string }) {
  const units = useUnits();
  const theme = useTheme();
  const rows = useMemo(() => sideBySideRows(data, units), [data, units]);
  const chart = useMemo(() => sideBySideChartData(data, units), [data, units]);
  const palette = [
    theme.palette.secondary.main,
    theme.palette.primary.light,
    theme.palette.info.main,
    theme.palette.warning.main,
  ];
  let lastGroup = '';

  return (
    <Stack spacing={3} className="side-by-side">
      <Stack direction="row" spacing={1} className="no-print" sx={{ flexWrap: 'wrap', gap: 1 }}>
        <Button
          startIcon={<DownloadIcon />}
          onClick={() =>
            saveBlob(new Blob([sideBySideCsv(data, rows)], { type: 'text/csv;charset=utf-8' }), `${fileName}.csv`)
          }
        >
          Download CSV
        </Button>
        <Button startIcon={<PrintIcon />} onClick={() => window.print()}>
          Print
        </Button>
      </Stack>

      {data.columns
        .filter((column) => column.invalid)
        .map((column) => (
          <Alert key={column.key} severity="warning">
            <strong>{column.name}</strong> cannot be computed with the house as it is now: {column.invalid?.message}{' '}
            (field <code>{column.invalid?.field}</code>). Edit or delete this alternative.
          </Alert>
        ))}

      <Paper sx={{ overflow: 'hidden' }}>
        <TableContainer sx={{ maxWidth: '100%', overflowX: 'auto' }} tabIndex={0} aria-label="Side-by-side table">
          <Table size="small" aria-label="The house and its alternatives side by side">
            <TableHead>
              <TableRow>
                <TableCell component="th" scope="col" sx={STICKY_FIRST}>
                  Quantity
                </TableCell>
                {data.columns.map((column, index) => (
                  <TableCell
                    key={column.key}
                    component="th"
                    scope="col"
                    sx={{ minWidth: 140, verticalAlign: 'bottom' }}
                  >
                    <Typography variant="subtitle2" component="span" sx={{ display: 'block' }}>
                      {column.name}
                    </Typography>
                    <Typography variant="caption" color="text.secondary">
                      {index === 0
                        ? 'the house as it is'
                        : column.changedFields.length > 0 || column.ownCalendar
                          ? alternativeChangesSentence(column.changedFields, column.ownCalendar).toLowerCase()
                          : 'no changes'}
                    </Typography>
                  </TableCell>
                ))}
              </TableRow>
            </TableHead>
            <TableBody>
              {rows.map((row) => {
                const groupRow =
                  row.group !== lastGroup ? (
                    <TableRow key={`group-${row.group}`}>
                      <TableCell
                        component="th"
                        scope="rowgroup"
                        sx={{ ...STICKY_FIRST, fontWeight: 600, bgcolor: 'action.hover' }}
                      >
                        {row.group}
                      </TableCell>
                      <TableCell colSpan={data.columns.length} sx={{ bgcolor: 'action.hover' }} />
                    </TableRow>
                  ) : null;
                lastGroup = row.group;
                return [
                  groupRow,
                  <TableRow key={row.key} data-row={row.key}>
                    <TableCell
                      component="th"
                      scope="row"
                      sx={{ ...STICKY_FIRST, pl: row.label.startsWith('  ') ? 4 : 2 }}
                    >
                      {row.label.trim()}
                    </TableCell>
                    {row.cells.map((cell, index) => (
                      <TableCell key={data.columns[index].key} data-column={data.columns[index].key}>
                        <Box
                          component="span"
                          sx={{
                            color: cell.warning ? 'warning.dark' : undefined,
                            fontWeight: cell.warning ? 600 : undefined,
                          }}
                        >
                          {cell.text}
                        </Box>
                        {cell.difference ? (
                          <Typography variant="caption" color="text.secondary" sx={{ display: 'block' }}>
                            {cell.difference} vs house
                          </Typography>
                        ) : null}
                      </TableCell>
                    ))}
                  </TableRow>,
                ];
              })}
            </TableBody>
          </Table>
        </TableContainer>
      </Paper>

      <Grid container spacing={3}>
        <Grid size={{ xs: 12, md: 6 }}>
          <Paper sx={{ p: 2 }}>
            <Typography variant="h3" component="h2" sx={{ mb: 1 }}>
              Season fuel cost
            </Typography>
            <Box sx={{ height: 240 }} role="img" aria-label="Bar chart of the season fuel cost of each column">
              <Bar
                data={{
                  labels: chart.labels,
                  datasets: [
                    {
                      label: `Season fuel cost (${data.seasonInputsUsed.currency})`,
                      data: chart.seasonCost,
                      backgroundColor: palette[0],
                    },
                  ],
                }}
                options={{
                  responsive: true,
                  maintainAspectRatio: false,
                  animation: false,
                  plugins: { legend: { display: false } },
                  scales: { y: { beginAtZero: true, title: { display: true, text: data.seasonInputsUsed.currency } } },
                }}
              />
            </Box>
          </Paper>
        </Grid>
        <Grid size={{ xs: 12, md: 6 }}>
          <Paper sx={{ p: 2 }}>
            <Typography variant="h3" component="h2" sx={{ mb: 1 }}>
              Design heat loss by part
            </Typography>
            <Box
              sx={{ height: 240 }}
              role="img"
              aria-label={`Stacked bar chart of the design heat loss by part of each column, in ${chart.powerUnit}`}
            >
              <Bar
                data={{
                  labels: chart.labels,
                  datasets: chart.heatLossParts.map((part, index) => ({
                    label: part.label,
                    data: part.values,
                    backgroundColor: palette[index % palette.length],
                  })),
                }}
                options={{
                  responsive: true,
                  maintainAspectRatio: false,
                  animation: false,
                  scales: {
                    x: { stacked: true },
                    y: { stacked: true, beginAtZero: true, title: { display: true, text: chart.powerUnit } },
                  },
                }}
              />
            </Box>
          </Paper>
        </Grid>
      </Grid>
    </Stack>
  );
}
