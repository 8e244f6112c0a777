import { DeleteOutlineIcon } from '../../../components/icons';
import { Alert, IconButton, MenuItem, Stack, TextField, Tooltip } from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { useMemo, useState } from 'react';
import type { FarmMember, FarmRole } from '../../../api/types';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { memberErrorMessage, ownerCount } from '../member-errors';
import { useChangeMemberRole, useRemoveMember } from '../mutations';
import { FARM_ROLES, ROLE_DESCRIPTIONS, ROLE_LABELS } from '../schemas';

export interface MembersTableProps {
  farmId: number;
  members: FarmMember[];
  loading?: boolean;
  /** show role pickers and remove buttons (members:manage) */
  canManage: boolean;
  /** the signed-in user's id, to mark "you" and warn before leaving the farm */
  currentUserId?: number;
  /** called after the signed-in user removed themselves */
  onLeftFarm?: () => void;
}

export function MembersTable({ farmId, members, loading, canManage, currentUserId, onLeftFarm }: MembersTableProps) {
  const changeRole = useChangeMemberRole(farmId);
  const removeMember = useRemoveMember(farmId);
  const [memberToRemove, setMemberToRemove] = useState<FarmMember | null>(null);
  const owners = ownerCount(members);
  const problem = memberErrorMessage(changeRole.error ?? removeMember.error);

  const columns = useMemo<GridColDef<FarmMember>[]>(
    () => [
      {
        field: 'name',
        headerName: 'Name',
        flex: 1,
        minWidth: 160,
        valueGetter: (_value, row) => (row.userId === currentUserId ? `${row.name} (you)` : row.name),
      },
      { field: 'email', headerName: 'E-mail', flex: 1, minWidth: 200 },
      {
        field: 'role',
        headerName: 'Role',
        width: 170,
        renderCell: ({ row, tabIndex }) => {
          const lastOwner = row.role === 'owner' && owners <= 1;
          if (!canManage) return ROLE_LABELS[row.role];
          return (
            <Tooltip title={lastOwner ? 'The only owner: make someone else an owner first' : ''}>
              <TextField
                select
                size="small"
                variant="standard"
                value={row.role}
                disabled={changeRole.isPending}
                slotProps={{ htmlInput: { 'aria-label': `Role of ${row.email}`, tabIndex } }}
                onChange={(event) => {
                  removeMember.reset();
                  changeRole.mutate({ userId: row.userId, role: event.target.value as FarmRole });
                }}
              >
                {FARM_ROLES.map((role) => (
                  <MenuItem key={role} value={role} disabled={lastOwner && role !== 'owner'}>
                    {ROLE_LABELS[role]}
                  </MenuItem>
                ))}
              </TextField>
            </Tooltip>
          );
        },
      },
      {
        field: 'may',
        headerName: 'May',
        flex: 1.2,
        minWidth: 220,
        sortable: false,
        valueGetter: (_value, row) => ROLE_DESCRIPTIONS[row.role],
      },
      ...(canManage
        ? [
            {
              field: 'actions',
              headerName: 'Remove',
              width: 90,
              sortable: false,
              renderCell: ({ row, tabIndex }) => {
                const lastOwner = row.role === 'owner' && owners <= 1;
                return (
                  <Tooltip title={lastOwner ? 'The only owner cannot be removed' : `Remove ${row.email}`}>
                    <span>
                      <IconButton
                        tabIndex={tabIndex}
                        aria-label={`Remove ${row.email}`}
                        disabled={lastOwner}
                        onClick={() => setMemberToRemove(row)}
                      >
                        <DeleteOutlineIcon />
                      </IconButton>
                    </span>
                  </Tooltip>
                );
              },
            } satisfies GridColDef<FarmMember>,
          ]
        : []),
    ],
    [canManage, changeRole, removeMember, currentUserId, owners],
  );

  const removingSelf = memberToRemove !== null && memberToRemove.userId === currentUserId;
  return (
    <Stack spacing={2}>
      {problem ? (
        <Alert severity="error" role="alert">
          {problem}
        </Alert>
      ) : null}
      <DataGrid
        aria-label="Farm members"
        getRowId={(row) => row.userId}
        rows={members}
        columns={columns}
        loading={loading}
        autoHeight
        disableRowSelectionOnClick
        hideFooter={members.length <= 25}
        initialState={{ sorting: { sortModel: [{ field: 'email', sort: 'asc' }] } }}
      />
      <ConfirmDialog
        open={memberToRemove !== null}
        title={removingSelf ? 'Leave this farm?' : `Remove ${memberToRemove?.email ?? ''}?`}
        message={
          removingSelf
            ? 'You will no longer see this farm, its houses or its results.'
            : `${memberToRemove?.name ?? 'They'} will no longer see this farm, its houses or its results. Their account stays.`
        }
        confirmLabel={removingSelf ? 'Leave farm' : 'Remove member'}
        busy={removeMember.isPending}
        onClose={() => setMemberToRemove(null)}
        onConfirm={() => {
          if (!memberToRemove) return;
          changeRole.reset();
          const leaving = removingSelf;
          removeMember.mutate(memberToRemove.userId, {
            onSuccess: () => {
              if (leaving) onLeftFarm?.();
            },
            onSettled: () => setMemberToRemove(null),
          });
        }}
      />
    </Stack>
  );
}
