import { DeleteOutlineIcon } from '../../../components/icons';
import { IconButton, MenuItem, Stack, TextField, Tooltip } from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { useMemo, useState } from 'react';
import type { SiteRole, User } from '../../../api/types';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { ErrorAlert } from '../../../components/feedback';
import { useDeleteUser, useUpdateUser } from '../mutations';
import { siteRoleSchema } from '../schemas';

/** Site administration: every account, its site role, and removal. Farm data is not shown here. */
export function UsersTable({
  users,
  currentUserId,
  loading,
}: {
  users: User[];
  currentUserId: number;
  loading?: boolean;
}) {
  const updateUser = useUpdateUser();
  const deleteUser = useDeleteUser();
  const [userToDelete, setUserToDelete] = useState<User | null>(null);

  const columns = useMemo<GridColDef<User>[]>(
    () => [
      { field: 'name', headerName: 'Name', flex: 1, minWidth: 160 },
      { field: 'email', headerName: 'E-mail', flex: 1, minWidth: 200 },
      {
        field: 'unitSystem',
        headerName: 'Units',
        width: 90,
        valueGetter: (_value, row) => (row.unitSystem === 'us' ? 'US' : 'SI'),
      },
      {
        field: 'siteRole',
        headerName: 'Site role',
        width: 160,
        renderCell: ({ row }) => (
          <TextField
            select
            size="small"
            variant="standard"
            value={row.siteRole}
            disabled={row.id === currentUserId || updateUser.isPending}
            slotProps={{ htmlInput: { 'aria-label': `Site role of ${row.email}` } }}
            onChange={(event) => {
              const siteRole = event.target.value as SiteRole;
              if (siteRoleSchema.isValidSync(siteRole)) updateUser.mutate({ userId: row.id, body: { siteRole } });
            }}
          >
            <MenuItem value="user">User</MenuItem>
            <MenuItem value="admin">Administrator</MenuItem>
          </TextField>
        ),
      },
      {
        field: 'actions',
        headerName: 'Actions',
        width: 90,
        sortable: false,
        renderCell: ({ row, tabIndex }) =>
          row.id === currentUserId ? null : (
            <Tooltip title={`Delete ${row.email}`}>
              <IconButton tabIndex={tabIndex} aria-label={`Delete ${row.email}`} onClick={() => setUserToDelete(row)}>
                <DeleteOutlineIcon />
              </IconButton>
            </Tooltip>
          ),
      },
    ],
    [currentUserId, updateUser],
  );

  return (
    <Stack spacing={2}>
      <ErrorAlert error={updateUser.error ?? deleteUser.error} />
      <DataGrid
        aria-label="Users"
        rows={users}
        columns={columns}
        loading={loading}
        autoHeight
        disableRowSelectionOnClick
        initialState={{ sorting: { sortModel: [{ field: 'email', sort: 'asc' }] } }}
      />
      <ConfirmDialog
        open={userToDelete !== null}
        title="Delete this account?"
        message={`${userToDelete?.email ?? ''} will no longer be able to sign in. Farm memberships of this account end.`}
        confirmLabel="Delete account"
        busy={deleteUser.isPending}
        onClose={() => setUserToDelete(null)}
        onConfirm={() => {
          if (userToDelete) deleteUser.mutate(userToDelete.id, { onSettled: () => setUserToDelete(null) });
        }}
      />
    </Stack>
  );
}
