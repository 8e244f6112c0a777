import { PageTitle } from '../../components/page-title';
import {
  Alert,
  Breadcrumbs,
  Checkbox,
  FormControlLabel,
  FormGroup,
  Link,
  Paper,
  Stack,
  Typography,
} from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useParams, useSearchParams } from 'react-router-dom';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { paths } from '../../config/paths';
import {
  houseAlternativesQueryOptions,
  MAX_SIDE_BY_SIDE,
  parseAlternativeIds,
  SideBySideView,
  sideBySideQueryOptions,
} from '../../features/alternatives';
import { farmAllows, farmDetailQueryOptions } from '../../features/farms';
import { houseDetailQueryOptions } from '../../features/houses';
import { CalibrationBasisSwitch, useHeatLossBasisParam } from '../../features/calibration';

/** The house as it is and up to four of its alternatives, in columns. */
export default function SideBySidePage() {
  const houseId = Number(useParams().houseId);
  const [search, setSearch] = useSearchParams();
  const house = useQuery(houseDetailQueryOptions(houseId));
  const farm = useQuery({ ...farmDetailQueryOptions(house.data?.farmId ?? 0), enabled: house.isSuccess });
  const alternatives = useQuery(houseAlternativesQueryOptions(houseId));
  const chosen = parseAlternativeIds(search.get('alternatives'));
  // with none named, the latest four
  const ids = search.has('alternatives') ? chosen : (alternatives.data ?? []).slice(-MAX_SIDE_BY_SIDE).map((a) => a.id);
  const canRun = farmAllows(farm.data, 'estimate:run');
  const [heatLossBasis, setHeatLossBasis] = useHeatLossBasisParam();
  // the house's updatedAt in the key: a saved house edit recomputes every column
  const comparison = useQuery({
    ...sideBySideQueryOptions(houseId, house.data?.updatedAt ?? '', {
      alternativeIds: ids,
      ...(heatLossBasis === 'calibrated' ? { heatLossBasis } : {}),
    }),
    enabled: house.isSuccess && alternatives.isSuccess && canRun,
  });

  if (house.isError) return <ErrorAlert error={house.error} title="House could not be loaded" />;
  if (!house.data || !farm.data) return <LoadingState label="Loading house…" />;

  const toggle = (id: number) => {
    const next = ids.includes(id) ? ids.filter((other) => other !== id) : [...ids, id];
    setSearch({ alternatives: next.join(',') }, { replace: true });
  };

  return (
    <Stack spacing={2}>
      <PageTitle title={'Side by side'} />
      <Breadcrumbs aria-label="Breadcrumb" className="no-print">
        <Link component={RouterLink} to={paths.farms}>
          Farms
        </Link>
        <Link component={RouterLink} to={paths.farm(farm.data.id)}>
          {farm.data.name}
        </Link>
        <Link component={RouterLink} to={paths.house(house.data.id)}>
          {house.data.name}
        </Link>
        <Typography color="text.primary">Side by side</Typography>
      </Breadcrumbs>
      <Typography variant="h1">Side by side: {house.data.name}</Typography>
      <Typography color="text.secondary">
        The house as it is and its alternatives, each through the same design-night, summer and season estimates, with
        the farm&apos;s climate and fuel prices and the house&apos;s production calendar (unless an alternative brings
        its own). Differences are against the house.
      </Typography>
      <CalibrationBasisSwitch farmId={farm.data.id} value={heatLossBasis} onChange={setHeatLossBasis} />

      <ErrorAlert error={alternatives.error} title="Alternatives could not be loaded" />
      {alternatives.data && alternatives.data.length === 0 ? (
        <Alert severity="info">
          This house has no alternatives yet. On the{' '}
          <Link component={RouterLink} to={paths.house(house.data.id)}>
            house page
          </Link>
          , edit the form and choose “Save as alternative”.
        </Alert>
      ) : null}
      {alternatives.data && alternatives.data.length > 0 ? (
        <Paper sx={{ p: 2 }} className="no-print">
          <Typography variant="h3" component="h2" sx={{ mb: 1 }}>
            Columns (up to {MAX_SIDE_BY_SIDE} alternatives)
          </Typography>
          <FormGroup row>
            {alternatives.data.map((alt) => (
              <FormControlLabel
                key={alt.id}
                control={
                  <Checkbox
                    checked={ids.includes(alt.id)}
                    disabled={!ids.includes(alt.id) && ids.length >= MAX_SIDE_BY_SIDE}
                    onChange={() => toggle(alt.id)}
                  />
                }
                label={alt.invalid ? `${alt.name} (invalid now)` : alt.name}
              />
            ))}
          </FormGroup>
        </Paper>
      ) : null}

      {!canRun ? (
        <Alert severity="info">Your role on this farm does not run estimates; ask a grower or the owner.</Alert>
      ) : null}
      {comparison.isPending && canRun ? <LoadingState label="Computing every column…" /> : null}
      <ErrorAlert error={comparison.error} title="The comparison could not be computed" />
      {comparison.data ? (
        <SideBySideView data={comparison.data} fileName={`side-by-side-${house.data.name.replace(/[^\w-]+/g, '-')}`} />
      ) : null}
    </Stack>
  );
}
