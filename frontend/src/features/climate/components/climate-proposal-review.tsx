import {
  Checkbox,
  FormControlLabel,
  MenuItem,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  TextField,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import type { SiteClimate } from '../../../api/types';
import { useUnits } from '../../../lib/units';
import { MONTH_SHORT_NAMES } from '../climate-form-values';
import {
  climateFromProposal,
  proposedDesign,
  type CoolingPercentile,
  type HeatingPercentile,
  type ProposalChoice,
  type ProposalValues,
} from '../weather-proposal';

const cellSx = { py: 0.5, px: 1 } as const;

export interface ClimateProposalReviewProps {
  proposal: ProposalValues;
  current: SiteClimate | null;
  choice: ProposalChoice;
  onChoice: (choice: ProposalChoice) => void;
  /** heading of the proposed column, e.g. "From the history" or "From the log" */
  proposedHeading: string;
}

/**
 * A climate proposal beside the farm's current values: the percentiles to use, the design values
 * and monthly normals side by side, and which parts to keep. Nothing is saved here; the dialog
 * around it saves `climateFromProposal(proposal, current, choice)`.
 */
export function ClimateProposalReview({
  proposal,
  current,
  choice,
  onChoice,
  proposedHeading,
}: ClimateProposalReviewProps) {
  const units = useUnits();
  const [wetBulbText, setWetBulbText] = useState('');
  const design = proposedDesign(proposal, { ...choice, wetBulbC: null });
  const needsWetBulb = choice.keepDesign && design.summerDesignWetBulbC === null;
  const toSave = climateFromProposal(proposal, current, choice);
  const t = units.label('temperature');

  const row = (
    label: string,
    currentSi: number | null | undefined,
    proposedSi: number | null | undefined,
    quantity: 'temperature' | 'temperatureDifference' = 'temperature',
  ) => (
    <TableRow key={label}>
      <TableCell component="th" scope="row" sx={cellSx}>
        {label}
      </TableCell>
      <TableCell sx={cellSx}>{units.format(quantity, currentSi ?? null)}</TableCell>
      <TableCell sx={cellSx}>{units.format(quantity, proposedSi ?? null)}</TableCell>
    </TableRow>
  );

  return (
    <Stack spacing={2}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <TextField
          select
          label="Heating design at"
          value={choice.heating}
          onChange={(event) => onChoice({ ...choice, heating: event.target.value as HeatingPercentile })}
          sx={{ minWidth: 200 }}
        >
          <MenuItem value="99.6">99.6 % (colder, the usual choice)</MenuItem>
          <MenuItem value="99">99 %</MenuItem>
        </TextField>
        <TextField
          select
          label="Cooling design at"
          value={choice.cooling}
          onChange={(event) => onChoice({ ...choice, cooling: event.target.value as CoolingPercentile })}
          sx={{ minWidth: 200 }}
        >
          <MenuItem value="1">1 %</MenuItem>
          <MenuItem value="0.4">0.4 % (hotter)</MenuItem>
        </TextField>
      </Stack>
      <TableContainer>
        <Table size="small" aria-label="Current and proposed design temperatures">
          <TableHead>
            <TableRow>
              <TableCell sx={cellSx}>Design value</TableCell>
              <TableCell sx={cellSx}>Now</TableCell>
              <TableCell sx={cellSx}>{proposedHeading}</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {row('Heating design temperature', current?.winterDesignC, design.winterDesignC)}
            {row('Cooling design temperature', current?.summerDesignC, design.summerDesignC)}
            {row('Coincident wet bulb', current?.summerDesignWetBulbC, design.summerDesignWetBulbC)}
            {row(
              'Daily range, warmest month',
              current?.summerDailyRangeK,
              design.summerDailyRangeK,
              'temperatureDifference',
            )}
          </TableBody>
        </Table>
      </TableContainer>
      {needsWetBulb ? (
        <TextField
          label={`Summer design wet bulb (${t})`}
          value={wetBulbText}
          onChange={(event) => {
            setWetBulbText(event.target.value);
            const value = Number(event.target.value);
            const valid = event.target.value.trim() !== '' && Number.isFinite(value);
            onChoice({ ...choice, wetBulbC: valid ? units.fromDisplay('temperature', value) : null });
          }}
          helperText="A temperature log has no humidity: enter the summer design wet bulb from a climate table"
          sx={{ maxWidth: 360 }}
          slotProps={{ htmlInput: { inputMode: 'decimal' } }}
        />
      ) : null}
      <TableContainer>
        <Table size="small" aria-label="Current and proposed monthly normals">
          <TableHead>
            <TableRow>
              <TableCell sx={cellSx}>Month</TableCell>
              <TableCell sx={cellSx}>Min now ({t})</TableCell>
              <TableCell sx={cellSx}>Min proposed ({t})</TableCell>
              <TableCell sx={cellSx}>Max now ({t})</TableCell>
              <TableCell sx={cellSx}>Max proposed ({t})</TableCell>
              <TableCell sx={cellSx}>Clearness proposed</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {proposal.monthly.map((month) => {
              const now = current?.monthly.find((m) => m.month === month.month);
              const clearness =
                month.clearness ??
                proposal.proposedClimate.monthly.find((m) => m.month === month.month)?.clearness ??
                null;
              return (
                <TableRow key={month.month}>
                  <TableCell component="th" scope="row" sx={cellSx}>
                    {MONTH_SHORT_NAMES[month.month - 1]}
                  </TableCell>
                  <TableCell sx={cellSx}>
                    {units.format('temperature', now?.meanDailyMinC ?? null, { withoutUnit: true })}
                  </TableCell>
                  <TableCell sx={cellSx}>
                    {units.format('temperature', month.meanDailyMinC, { withoutUnit: true })}
                  </TableCell>
                  <TableCell sx={cellSx}>
                    {units.format('temperature', now?.meanDailyMaxC ?? null, { withoutUnit: true })}
                  </TableCell>
                  <TableCell sx={cellSx}>
                    {units.format('temperature', month.meanDailyMaxC, { withoutUnit: true })}
                  </TableCell>
                  <TableCell sx={cellSx}>{clearness === null ? '—' : `${Math.round(clearness * 100)} %`}</TableCell>
                </TableRow>
              );
            })}
          </TableBody>
        </Table>
      </TableContainer>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <FormControlLabel
          control={
            <Checkbox
              checked={choice.keepDesign}
              onChange={(event) => onChoice({ ...choice, keepDesign: event.target.checked })}
            />
          }
          label="Keep the design temperatures"
        />
        <FormControlLabel
          control={
            <Checkbox
              checked={choice.keepMonthly}
              onChange={(event) => onChoice({ ...choice, keepMonthly: event.target.checked })}
            />
          }
          label="Keep the monthly normals"
        />
      </Stack>
      {!toSave ? (
        <Typography variant="body2" color="error">
          {needsWetBulb
            ? 'Enter the summer design wet bulb to keep the design temperatures.'
            : current
              ? 'Tick at least one part to keep.'
              : 'This farm has no climate yet: keep both parts to save a complete climate.'}
        </Typography>
      ) : null}
    </Stack>
  );
}
