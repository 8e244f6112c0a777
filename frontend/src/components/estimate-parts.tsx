import { Alert, AlertTitle, Box, Chip, Link, List, ListItem, Paper, Stack, Tooltip, Typography } from '@mui/material';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { ApiError } from '../api/client';
import type { CoolingAssumption, HeatingAssumption, SeasonAssumption } from '../api/types';
import { paths } from '../config/paths';
import { quantityOfSiUnit, useUnits, type Units } from '../lib/units';
import { ErrorAlert } from './feedback';

/**
 * Pieces the heating and cooling result panels share: the assumptions list with provenance, the
 * cautions alert, and the notes shown instead of a result (no permission, no farm climate).
 */

/** An assumption as the heating, cooling and season answers list it (the API's one shape). */
export type EstimateAssumption = HeatingAssumption | CoolingAssumption | SeasonAssumption;
export type Confidence = EstimateAssumption['confidence'];

export const CONFIDENCE_LABELS: Record<Confidence, string> = {
  verified: 'verified in the source',
  'verified-secondary': 'verified in a quoted copy',
  derived: 'derived from sourced values',
  memory: 'recalled from a handbook, not yet checked',
  'common-practice': 'rule of thumb, no single source',
  'user-entered': 'entered for this house',
};

/** Values of weaker provenance that the reader should notice. */
export function isWeakConfidence(confidence: Confidence): boolean {
  return confidence === 'memory' || confidence === 'common-practice';
}

/** An assumption's value in the user's units where its unit is a physical one; as given otherwise. */
export function formatAssumptionValue(assumption: Pick<EstimateAssumption, 'value' | 'unit'>, units: Units): string {
  const { value, unit } = assumption;
  if (typeof value === 'string') {
    const text = units.prose(value);
    return unit && unit !== '–' ? `${text} ${unit}` : text;
  }
  const quantity = quantityOfSiUnit(unit);
  if (quantity) return units.format(quantity, value, { decimals: Math.max(units.decimals(quantity), 1) });
  const number = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4 }).format(value);
  if (unit === 'fraction' || unit === '–' || unit === '') return number;
  return `${number} ${unit}`;
}

export function AssumptionList({ assumptions, units }: { assumptions: EstimateAssumption[]; units: Units }) {
  return (
    <List dense disablePadding aria-label="Assumptions">
      {assumptions.map((assumption) => (
        <ListItem key={assumption.key} disableGutters sx={{ display: 'block', py: 0.5 }}>
          <Tooltip
            title={
              <Box>
                <Typography variant="caption" component="div" sx={{ fontWeight: 500 }}>
                  Source ({CONFIDENCE_LABELS[assumption.confidence]})
                </Typography>
                <Typography variant="caption" component="div">
                  {assumption.source}
                </Typography>
              </Box>
            }
            placement="left"
            describeChild
          >
            <Box tabIndex={0} sx={{ cursor: 'help' }}>
              <Stack direction="row" spacing={1} useFlexGap sx={{ flexWrap: 'wrap', alignItems: 'baseline' }}>
                <Typography variant="body2">{units.prose(assumption.label)}:</Typography>
                <Typography variant="body2" sx={{ fontWeight: 500 }}>
                  {formatAssumptionValue(assumption, units)}
                </Typography>
                {assumption.overridden ? <Chip size="small" color="info" label="overridden" /> : null}
                {assumption.confidence === 'memory' ? (
                  <Chip size="small" color="warning" variant="outlined" label="from memory" />
                ) : null}
                {assumption.confidence === 'common-practice' ? (
                  <Chip size="small" color="warning" variant="outlined" label="rule of thumb" />
                ) : null}
                {assumption.confidence === 'user-entered' ? (
                  <Chip size="small" variant="outlined" label="your value" />
                ) : null}
              </Stack>
            </Box>
          </Tooltip>
        </ListItem>
      ))}
    </List>
  );
}

/** The API's cautions, their {{kind:value}} quantity tokens written in the user's units. */
export function CautionsAlert({ title, cautions }: { title: string; cautions: string[] }) {
  const units = useUnits();
  if (cautions.length === 0) return null;
  return (
    <Alert severity="warning" role="note">
      <AlertTitle>{title}</AlertTitle>
      <Box component="ul" sx={{ m: 0, pl: 2 }}>
        {cautions.map((caution) => (
          <li key={caution}>
            <Typography variant="body2">{units.prose(caution)}</Typography>
          </li>
        ))}
      </Box>
    </Alert>
  );
}

/** True when the API refused because the farm has no climate yet (422 naming a conditions.* field). */
export function isMissingClimateError(error: unknown): boolean {
  return error instanceof ApiError && error.status === 422 && (error.field ?? '').startsWith('conditions.');
}

export function NoPermissionNote({ what }: { what: string }) {
  return (
    <Alert severity="info" role="note">
      Your role on this farm lets you read its houses but not run {what}. Ask the farm's owner for a grower or adviser
      role to see them.
    </Alert>
  );
}

export function MissingClimateNote({ farmId, children }: { farmId: number; children?: ReactNode }) {
  return (
    <Alert severity="info" role="note">
      <AlertTitle>This farm has no climate yet</AlertTitle>
      The estimate needs the farm's design temperatures. Enter them on the{' '}
      <Link component={RouterLink} to={paths.farm(farmId)}>
        farm page
      </Link>
      {children}
    </Alert>
  );
}

/** A refused estimate: the friendly notes for the expected cases, the error otherwise. */
export function EstimateError({
  error,
  farmId,
  what,
  missingClimateHint,
}: {
  error: unknown;
  farmId: number;
  what: string;
  missingClimateHint?: ReactNode;
}) {
  if (error instanceof ApiError && error.status === 403) return <NoPermissionNote what={what} />;
  if (isMissingClimateError(error))
    return <MissingClimateNote farmId={farmId}>{missingClimateHint}</MissingClimateNote>;
  return <ErrorAlert error={error} title={`The ${what} could not be computed`} />;
}

/** A labelled figure: small caption above a larger value. */
export function Figure({ label, value, testId }: { label: string; value: ReactNode; testId?: string }) {
  return (
    <Box>
      <Typography variant="caption" color="text.secondary" component="div">
        {label}
      </Typography>
      <Typography variant="body1" component="div" sx={{ fontWeight: 500 }} data-testid={testId}>
        {value}
      </Typography>
    </Box>
  );
}

export function formatPercent(fraction: number, decimals = 0): string {
  return `${new Intl.NumberFormat('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals }).format(
    fraction * 100,
  )} %`;
}

/** The frame every result panel on the house page shares: a titled section, flagged while it shows unsaved edits. */
export function ResultPanel({
  headingId,
  title,
  unsavedEdits = false,
  busy = false,
  children,
}: {
  headingId: string;
  title: string;
  unsavedEdits?: boolean;
  busy?: boolean;
  children: ReactNode;
}) {
  return (
    <Paper component="section" aria-labelledby={headingId} aria-busy={busy} sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
          <Typography id={headingId} variant="h3" component="h3" sx={{ flexGrow: 1 }}>
            {title}
          </Typography>
          {unsavedEdits ? <Chip size="small" color="secondary" label="Unsaved edits" /> : null}
        </Stack>
        {children}
      </Stack>
    </Paper>
  );
}
