import { Link } from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { useMemo } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import type { House } from '../../../api/types';
import { paths } from '../../../config/paths';
import { useUnits } from '../../../lib/units';
import { floorAreaM2, heaterOutputW, SHAPE_LABELS } from '../house-form-values';

export function HousesTable({ houses, loading }: { houses: House[]; loading?: boolean }) {
  const units = useUnits();
  const columns = useMemo<GridColDef<House>[]>(() => {
    const numberColumn = (
      field: string,
      headerName: string,
      value: (house: House) => number,
      format: (siValue: number) => string,
      width = 130,
    ): GridColDef<House> => ({
      field,
      headerName,
      type: 'number',
      width,
      valueGetter: (_value, row) => value(row),
      valueFormatter: (siValue: number) => format(siValue),
    });
    return [
      {
        field: 'name',
        headerName: 'House',
        flex: 1,
        minWidth: 160,
        renderCell: ({ row, tabIndex }) => (
          <Link component={RouterLink} tabIndex={tabIndex} to={paths.house(row.id)}>
            {row.name}
          </Link>
        ),
      },
      {
        field: 'shape',
        headerName: 'Shape',
        width: 130,
        valueGetter: (_value, row) => SHAPE_LABELS[row.shape] ?? row.shape,
      },
      { field: 'spans', headerName: 'Spans', type: 'number', width: 80 },
      numberColumn(
        'widthM',
        `Span width (${units.label('length')})`,
        (house) => house.widthM,
        (v) => units.format('length', v, { withoutUnit: true }),
        150,
      ),
      numberColumn(
        'lengthM',
        `Length (${units.label('length')})`,
        (house) => house.lengthM,
        (v) => units.format('length', v, { withoutUnit: true }),
      ),
      numberColumn('floorArea', `Floor (${units.label('area')})`, floorAreaM2, (v) =>
        units.format('area', v, { withoutUnit: true, decimals: 0 }),
      ),
      numberColumn(
        'heaterOutput',
        `Heater output (${units.label('power')})`,
        heaterOutputW,
        (v) => units.format('power', v, { withoutUnit: true, decimals: 0 }),
        180,
      ),
    ];
  }, [units]);

  return (
    <DataGrid
      aria-label="Houses"
      rows={houses}
      columns={columns}
      loading={loading}
      autoHeight
      disableRowSelectionOnClick
      hideFooter={houses.length <= 25}
      initialState={{ sorting: { sortModel: [{ field: 'name', sort: 'asc' }] } }}
      localeText={{ noRowsLabel: 'No houses on this farm yet.' }}
    />
  );
}
