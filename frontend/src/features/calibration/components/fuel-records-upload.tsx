import { UploadFileIcon } from '../../../components/icons';
import { Alert, Box, Button, MenuItem, Paper, Stack, TextField, Typography } from '@mui/material';
import { useState } from 'react';
import type { FuelRecordColumnMapping, FuelRecordCsvInspection } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import { unitsOfFuel, type FuelOption } from '../fuel-record-values';
import { useInspectFuelCsv, useUploadFuelCsv } from '../mutations';

type ColumnField = Exclude<keyof FuelRecordColumnMapping, 'fuelId' | 'unit' | 'houseIds'>;

const COLUMN_FIELDS: Array<{ field: ColumnField; label: string; required?: boolean }> = [
  { field: 'startColumn', label: 'Period from', required: true },
  { field: 'endColumn', label: 'Period to', required: true },
  { field: 'quantityColumn', label: 'Quantity', required: true },
  { field: 'unitColumn', label: 'Unit (or one unit below)' },
  { field: 'fuelColumn', label: 'Fuel (or one fuel below)' },
  { field: 'housesColumn', label: 'Houses, separated by ; (or the houses below)' },
  { field: 'costColumn', label: 'Cost' },
  { field: 'nonHeatingColumn', label: 'Non-heating use per day' },
];

const NONE = '';

/** Upload a CSV of bills: the server proposes which column is which, the user confirms, then every row is stored or none. */
export function FuelRecordsUpload({
  farmId,
  fuels,
  houses,
}: {
  farmId: number;
  fuels: FuelOption[];
  houses: Array<{ id: number; name: string }>;
}) {
  const inspect = useInspectFuelCsv(farmId);
  const upload = useUploadFuelCsv(farmId);
  const [file, setFile] = useState<File | null>(null);
  const [inspection, setInspection] = useState<FuelRecordCsvInspection | null>(null);
  const [mapping, setMapping] = useState<Partial<FuelRecordColumnMapping>>({});

  const choose = (chosen: File | null) => {
    setFile(chosen);
    setInspection(null);
    upload.reset();
    if (!chosen) return;
    inspect.mutate(chosen, {
      onSuccess: (result) => {
        setInspection(result);
        setMapping({ ...result.proposed, fuelId: 'propane', unit: undefined, houseIds: [] });
      },
    });
  };

  const fixedUnits = unitsOfFuel(fuels, mapping.fuelId ?? '');
  const ready =
    inspection !== null &&
    Boolean(mapping.startColumn && mapping.endColumn && mapping.quantityColumn) &&
    (Boolean(mapping.unitColumn) || Boolean(mapping.unit)) &&
    (Boolean(mapping.fuelColumn) || Boolean(mapping.fuelId)) &&
    (Boolean(mapping.housesColumn) || (mapping.houseIds?.length ?? 0) > 0);

  const send = () => {
    if (!file || !ready) return;
    const body = Object.fromEntries(
      Object.entries({
        ...mapping,
        fuelId: mapping.fuelColumn ? undefined : mapping.fuelId,
        unit: mapping.unitColumn ? undefined : mapping.unit,
        houseIds: mapping.housesColumn ? undefined : mapping.houseIds,
      }).filter(([, value]) => value !== undefined && value !== NONE),
    ) as unknown as FuelRecordColumnMapping;
    upload.mutate({ file, mapping: body }, { onSuccess: () => setInspection(null) });
  };

  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Typography variant="h3">Upload bills from a CSV file</Typography>
        <Typography variant="body2" color="text.secondary">
          One bill or delivery per row, with the dates of the period (YYYY-MM-DD) and the quantity. You confirm which
          column holds what; if any row is wrong, nothing is stored and each problem is listed by row.
        </Typography>
        <Box>
          <Button component="label" variant="outlined" startIcon={<UploadFileIcon />}>
            Choose CSV file
            <input
              hidden
              type="file"
              accept=".csv,text/csv"
              aria-label="CSV file of fuel bills"
              onChange={(event) => choose(event.target.files?.[0] ?? null)}
            />
          </Button>
          {file ? (
            <Typography component="span" sx={{ ml: 2 }}>
              {file.name}
            </Typography>
          ) : null}
        </Box>
        <ErrorAlert error={inspect.error} title="The file could not be read" />
        {inspection ? (
          <Stack spacing={2}>
            <Typography variant="body2">
              {inspection.rowCount} rows. First row: {inspection.preview[0]?.join(' | ')}
            </Typography>
            <Stack direction="row" useFlexGap spacing={2} sx={{ flexWrap: 'wrap' }}>
              {COLUMN_FIELDS.map(({ field, label, required }) => (
                <TextField
                  key={field}
                  select
                  size="small"
                  label={label}
                  required={required}
                  value={mapping[field] ?? NONE}
                  onChange={(event) =>
                    setMapping((current) => ({ ...current, [field]: event.target.value || undefined }))
                  }
                  sx={{ minWidth: 220 }}
                >
                  <MenuItem value={NONE}>(no such column)</MenuItem>
                  {inspection.columns.map((column) => (
                    <MenuItem key={column} value={column}>
                      {column}
                    </MenuItem>
                  ))}
                </TextField>
              ))}
            </Stack>
            <Stack direction="row" useFlexGap spacing={2} sx={{ flexWrap: 'wrap' }}>
              {!mapping.fuelColumn ? (
                <TextField
                  select
                  size="small"
                  label="Fuel of every row"
                  value={mapping.fuelId ?? ''}
                  onChange={(event) =>
                    setMapping((current) => ({ ...current, fuelId: event.target.value, unit: undefined }))
                  }
                  sx={{ minWidth: 200 }}
                >
                  {fuels.map((fuel) => (
                    <MenuItem key={fuel.id} value={fuel.id}>
                      {fuel.label}
                    </MenuItem>
                  ))}
                </TextField>
              ) : null}
              {!mapping.unitColumn ? (
                <TextField
                  select
                  size="small"
                  label="Unit of every row"
                  value={mapping.unit ?? ''}
                  onChange={(event) => setMapping((current) => ({ ...current, unit: event.target.value }))}
                  sx={{ minWidth: 160 }}
                >
                  {fixedUnits.map((unit) => (
                    <MenuItem key={unit} value={unit}>
                      {unit}
                    </MenuItem>
                  ))}
                </TextField>
              ) : null}
              {!mapping.housesColumn ? (
                <TextField
                  select
                  size="small"
                  label="Houses of every row"
                  value={mapping.houseIds ?? []}
                  slotProps={{ select: { multiple: true } }}
                  onChange={(event) =>
                    setMapping((current) => ({ ...current, houseIds: event.target.value as unknown as number[] }))
                  }
                  sx={{ minWidth: 260 }}
                >
                  {houses.map((house) => (
                    <MenuItem key={house.id} value={house.id}>
                      {house.name}
                    </MenuItem>
                  ))}
                </TextField>
              ) : null}
            </Stack>
            <Box>
              <Button variant="contained" onClick={send} disabled={!ready || upload.isPending}>
                Store the bills
              </Button>
            </Box>
          </Stack>
        ) : null}
        <ErrorAlert error={upload.error} title="Nothing was stored" />
        {upload.data ? <Alert severity="success">{upload.data.created} bills stored.</Alert> : null}
      </Stack>
    </Paper>
  );
}
