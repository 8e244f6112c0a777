import { AddIcon, CancelIcon, DeleteOutlineIcon, EditIcon, SaveIcon } from '../../../components/icons';
import { Alert, Box, Button, Checkbox, ListItemText, MenuItem, Select, Stack } from '@mui/material';
import {
  DataGrid,
  GridActionsCellItem,
  GridRowModes,
  useGridApiContext,
  type GridColDef,
  type GridRenderEditCellParams,
  type GridRowModesModel,
} from '@mui/x-data-grid';
import { useMemo, useRef, useState } from 'react';
import { ApiError } from '../../../api/client';
import type { FuelRecord } from '../../../api/types';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { ErrorAlert } from '../../../components/feedback';
import { useUnits } from '../../../lib/units';
import {
  newRow,
  parseCellNumber,
  recordToRow,
  rowChanges,
  rowProblems,
  rowToInput,
  unitsOfFuel,
  type FuelOption,
  type FuelRecordRow,
} from '../fuel-record-values';
import { useCreateFuelRecord, useDeleteFuelRecord, useUpdateFuelRecord } from '../mutations';

export interface FuelRecordsGridProps {
  farmId: number;
  records: FuelRecord[];
  loading: boolean;
  fuels: FuelOption[];
  houses: Array<{ id: number; name: string }>;
  canEdit: boolean;
  /** the farm's currency (ISO 4217) for the cost column */
  currency: string;
}

/** A problem found before sending, shown above the table. */
class RowInputError extends Error {}

function HousesEditCell({
  id,
  field,
  value,
  houses,
}: GridRenderEditCellParams & { houses: FuelRecordsGridProps['houses'] }) {
  const apiRef = useGridApiContext();
  const selected = (value as number[] | undefined) ?? [];
  return (
    <Select
      multiple
      autoFocus
      fullWidth
      size="small"
      value={selected}
      inputProps={{ 'aria-label': 'Houses the fuel went to' }}
      renderValue={(ids) =>
        houses
          .filter((house) => ids.includes(house.id))
          .map((house) => house.name)
          .join(', ')
      }
      onChange={(event) => {
        const next = event.target.value as unknown as number[];
        void apiRef.current.setEditCellValue({ id, field, value: next });
      }}
    >
      {houses.map((house) => (
        <MenuItem key={house.id} value={house.id}>
          <Checkbox checked={selected.includes(house.id)} size="small" />
          <ListItemText primary={house.name} />
        </MenuItem>
      ))}
    </Select>
  );
}

function UnitEditCell({ id, field, value, fuels }: GridRenderEditCellParams & { fuels: FuelOption[] }) {
  const apiRef = useGridApiContext();
  const row = apiRef.current.getRowWithUpdatedValues(id, field) as FuelRecordRow;
  const units = unitsOfFuel(fuels, row.fuelId);
  return (
    <Select
      fullWidth
      size="small"
      value={units.includes(String(value)) ? String(value) : ''}
      inputProps={{ 'aria-label': 'Unit' }}
      onChange={(event) => void apiRef.current.setEditCellValue({ id, field, value: event.target.value })}
    >
      {units.map((unit) => (
        <MenuItem key={unit} value={unit}>
          {unit}
        </MenuItem>
      ))}
    </Select>
  );
}

/** The farm's fuel bills and deliveries, edited row by row in the table. */
export function FuelRecordsGrid({ farmId, records, loading, fuels, houses, canEdit, currency }: FuelRecordsGridProps) {
  const units = useUnits();
  const create = useCreateFuelRecord(farmId);
  const update = useUpdateFuelRecord(farmId);
  const remove = useDeleteFuelRecord(farmId);
  const [drafts, setDrafts] = useState<FuelRecordRow[]>([]);
  const [rowModes, setRowModes] = useState<GridRowModesModel>({});
  const [problem, setProblem] = useState<unknown>(null);
  const [toDelete, setToDelete] = useState<FuelRecordRow | null>(null);
  const serial = useRef(0);
  const stored = useMemo(() => records.map(recordToRow), [records]);
  const rows = useMemo(() => [...stored, ...drafts], [stored, drafts]);
  const houseName = useMemo(() => new Map(houses.map((house) => [house.id, house.name])), [houses]);

  const addRow = () => {
    serial.current += 1;
    const row = newRow(fuels, rows.at(-1), units.system, serial.current);
    setDrafts((list) => [...list, row]);
    setRowModes((modes) => ({ ...modes, [row.id]: { mode: GridRowModes.Edit, fieldToFocus: 'quantity' } }));
  };

  const processRowUpdate = async (row: FuelRecordRow, before: FuelRecordRow): Promise<FuelRecordRow> => {
    const problems = rowProblems(row, fuels);
    if (problems.length > 0) throw new RowInputError(problems.map((item) => item.message).join(' '));
    setProblem(null);
    if (row.isNew) {
      const saved = await create.mutateAsync(rowToInput(row));
      setDrafts((list) => list.filter((draft) => draft.id !== row.id));
      return recordToRow(saved);
    }
    const changes = rowChanges(row, before);
    if (Object.keys(changes).length === 0) return before;
    return recordToRow(await update.mutateAsync({ id: Number(row.id), body: changes, version: row.version }));
  };

  const onError = (error: unknown) => {
    setProblem(
      error instanceof ApiError && error.status === 409
        ? new Error('Someone else changed this bill since you loaded it; the list now shows their version.')
        : error,
    );
    // keep the row open so the entry can be corrected
    const editing = Object.entries(rowModes).find(([, mode]) => mode.mode === GridRowModes.View);
    if (editing) setRowModes((modes) => ({ ...modes, [editing[0]]: { mode: GridRowModes.Edit } }));
  };

  const numberColumn = (field: 'quantity' | 'cost' | 'nonHeatingPerDay', headerName: string, width: number) =>
    ({
      field,
      headerName,
      width,
      editable: canEdit,
      type: 'string',
      valueFormatter: (value: number | null) =>
        value === null || value === undefined
          ? '—'
          : field === 'cost'
            ? units.money(value, currency)
            : new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 }).format(value),
      valueParser: (value: unknown) => parseCellNumber(value),
    }) satisfies GridColDef<FuelRecordRow>;

  const columns: GridColDef<FuelRecordRow>[] = [
    {
      field: 'fuelId',
      headerName: 'Fuel',
      width: 140,
      editable: canEdit,
      type: 'singleSelect',
      valueOptions: fuels.map((fuel) => ({ value: fuel.id, label: fuel.label })),
    },
    numberColumn('quantity', 'Quantity', 110),
    {
      field: 'quantityUnit',
      headerName: 'Unit',
      width: 100,
      editable: canEdit,
      renderEditCell: (params) => <UnitEditCell {...params} fuels={fuels} />,
    },
    { field: 'startDate', headerName: 'From (YYYY-MM-DD)', width: 150, editable: canEdit },
    { field: 'endDate', headerName: 'To (YYYY-MM-DD)', width: 150, editable: canEdit },
    {
      field: 'houseIds',
      headerName: 'Houses served',
      flex: 1,
      minWidth: 200,
      editable: canEdit,
      sortable: false,
      valueFormatter: (value: number[]) => (value ?? []).map((id) => houseName.get(id) ?? `house ${id}`).join(', '),
      renderEditCell: (params) => <HousesEditCell {...params} houses={houses} />,
    },
    numberColumn('cost', 'Cost', 110),
    numberColumn('nonHeatingPerDay', 'Non-heating use per day', 120),
  ];
  if (canEdit) {
    columns.push({
      field: 'actions',
      type: 'actions',
      headerName: 'Actions',
      width: 110,
      getActions: ({ id, row }) => {
        if (rowModes[id]?.mode === GridRowModes.Edit) {
          return [
            <GridActionsCellItem
              key="save"
              icon={<SaveIcon />}
              label="Save bill"
              onClick={() => setRowModes((modes) => ({ ...modes, [id]: { mode: GridRowModes.View } }))}
            />,
            <GridActionsCellItem
              key="cancel"
              icon={<CancelIcon />}
              label="Cancel"
              onClick={() => {
                setRowModes((modes) => ({ ...modes, [id]: { mode: GridRowModes.View, ignoreModifications: true } }));
                if (row.isNew) setDrafts((list) => list.filter((draft) => draft.id !== id));
              }}
            />,
          ];
        }
        return [
          <GridActionsCellItem
            key="edit"
            icon={<EditIcon />}
            label="Edit bill"
            onClick={() => setRowModes((modes) => ({ ...modes, [id]: { mode: GridRowModes.Edit } }))}
          />,
          <GridActionsCellItem
            key="delete"
            icon={<DeleteOutlineIcon />}
            label="Delete bill"
            onClick={() => setToDelete(row)}
          />,
        ];
      },
    });
  }

  return (
    <Stack spacing={1}>
      {canEdit ? (
        <Box>
          <Button startIcon={<AddIcon />} variant="outlined" onClick={addRow} disabled={fuels.length === 0}>
            Add a bill or delivery
          </Button>
        </Box>
      ) : null}
      {problem instanceof RowInputError ? <Alert severity="error">{problem.message}</Alert> : null}
      {problem && !(problem instanceof RowInputError) ? (
        <ErrorAlert error={problem} title="The bill could not be saved" />
      ) : null}
      <ErrorAlert error={remove.error} title="The bill could not be deleted" />
      <Box sx={{ width: '100%' }}>
        <DataGrid
          rows={rows}
          columns={columns}
          loading={loading}
          editMode="row"
          rowModesModel={rowModes}
          onRowModesModelChange={setRowModes}
          processRowUpdate={processRowUpdate}
          onProcessRowUpdateError={onError}
          autoHeight
          disableRowSelectionOnClick
          hideFooter={rows.length <= 25}
          localeText={{ noRowsLabel: 'No fuel bills yet' }}
          aria-label="Fuel bills and deliveries"
        />
      </Box>
      <ConfirmDialog
        open={toDelete !== null}
        title="Delete this bill?"
        message={toDelete ? `The bill from ${toDelete.startDate} to ${toDelete.endDate} will be deleted.` : ''}
        confirmLabel="Delete"
        onClose={() => setToDelete(null)}
        onConfirm={() => {
          if (toDelete) remove.mutate(Number(toDelete.id));
          setToDelete(null);
        }}
      />
    </Stack>
  );
}
