import { Link } from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { useMemo } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import type { Farm } from '../../../api/types';
import { paths } from '../../../config/paths';
import { useUnits } from '../../../lib/units';

const ROLE_LABELS: Record<Farm['myRole'], string> = {
  owner: 'Owner',
  grower: 'Grower',
  adviser: 'Adviser',
  viewer: 'Viewer',
};

export function FarmsTable({ farms, loading }: { farms: Farm[]; loading?: boolean }) {
  const units = useUnits();
  const columns = useMemo<GridColDef<Farm>[]>(
    () => [
      {
        field: 'name',
        headerName: 'Farm',
        flex: 1,
        minWidth: 180,
        renderCell: ({ row, tabIndex }) => (
          <Link component={RouterLink} tabIndex={tabIndex} to={paths.farm(row.id)}>
            {row.name}
          </Link>
        ),
      },
      { field: 'houseCount', headerName: 'Houses', type: 'number', width: 100 },
      {
        field: 'myRole',
        headerName: 'My role',
        width: 120,
        valueGetter: (_value, row) => ROLE_LABELS[row.myRole] ?? row.myRole,
      },
      {
        field: 'location',
        headerName: 'Location',
        minWidth: 170,
        sortable: false,
        valueGetter: (_value, row) => `${row.latitudeDeg.toFixed(3)}°, ${row.longitudeDeg.toFixed(3)}°`,
      },
      {
        field: 'elevationM',
        headerName: `Elevation (${units.label('length')})`,
        type: 'number',
        width: 150,
        valueFormatter: (value: number) => units.format('length', value, { decimals: 0, withoutUnit: true }),
      },
      { field: 'timeZone', headerName: 'Time zone', minWidth: 160, flex: 0.6 },
    ],
    [units],
  );
  return (
    <DataGrid
      aria-label="Farms"
      rows={farms}
      columns={columns}
      loading={loading}
      autoHeight
      disableRowSelectionOnClick
      hideFooter={farms.length <= 25}
      initialState={{ sorting: { sortModel: [{ field: 'name', sort: 'asc' }] } }}
      localeText={{ noRowsLabel: 'No farms yet. Create one to add its houses.' }}
    />
  );
}
