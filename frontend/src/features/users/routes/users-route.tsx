import { useState } from 'react';
import type { ColumnDef } from '@tanstack/react-table';
import { Button, Chip, MenuItem, Select, Switch, Tooltip } from '@mui/material';
import PersonAddOutlined from '@mui/icons-material/PersonAddOutlined';
import { ROLES, type Role, type UserDetails } from '@linkloom/shared';
import { DataTable } from '../../../components/ui/data-table.js';
import { PageHeader } from '../../../components/ui/page-header.js';
import { useTableUrlState } from '../../../components/ui/use-url-state.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { errorMessage } from '../../../lib/api-client.js';
import { useSession } from '../../../lib/session.js';
import { useUsers } from '../api/get-users.js';
import { useUpdateUser } from '../api/update-user.js';
import { CreateUserDialog } from '../components/create-user-dialog.js';

const when = (iso?: string | null) => (iso ? new Date(iso).toLocaleString() : 'never');

export default function UsersRoute() {
  const table = useTableUrlState({ pageSize: 50 });
  const users = useUsers(table.page, table.pageSize);
  const update = useUpdateUser();
  const { notify } = useNotifier();
  const me = useSession()?.user.id;
  const [creating, setCreating] = useState(false);

  const patch = (user: UserDetails, change: { role?: Role; disabled?: boolean }, done: string) =>
    update.mutate(
      { id: user.id, ...change },
      {
        onSuccess: () => notify(done),
        onError: (error) => notify(errorMessage(error), 'error'),
      },
    );

  const columns: ColumnDef<UserDetails, unknown>[] = [
    { accessorKey: 'name', header: 'Name', enableSorting: false },
    { accessorKey: 'email', header: 'E-mail', enableSorting: false },
    {
      accessorKey: 'role',
      header: 'Role',
      enableSorting: false,
      cell: ({ row }) => (
        <Select
          size="small"
          value={row.original.role}
          disabled={row.original.id === me}
          inputProps={{ 'aria-label': `Role of ${row.original.name}` }}
          onChange={(e) => patch(row.original, { role: e.target.value as Role }, `${row.original.name} is now ${e.target.value}`)}
        >
          {ROLES.map((role) => (
            <MenuItem key={role} value={role}>
              {role}
            </MenuItem>
          ))}
        </Select>
      ),
    },
    {
      id: 'active',
      header: 'Can sign in',
      enableSorting: false,
      cell: ({ row }) => (
        <Tooltip title={row.original.id === me ? 'You cannot disable yourself' : ''}>
          <span>
            <Switch
              checked={!row.original.disabled}
              disabled={row.original.id === me}
              slotProps={{ input: { 'aria-label': `${row.original.name} can sign in` } }}
              onChange={(e) =>
                patch(row.original, { disabled: !e.target.checked }, `${row.original.name} ${e.target.checked ? 'enabled' : 'disabled'}`)
              }
            />
          </span>
        </Tooltip>
      ),
    },
    { id: 'lastSignInAt', header: 'Last sign-in', enableSorting: false, cell: ({ row }) => when(row.original.lastSignInAt) },
    {
      id: 'you',
      header: '',
      enableSorting: false,
      enableHiding: false,
      cell: ({ row }) => (row.original.id === me ? <Chip size="small" label="you" /> : null),
    },
  ];

  return (
    <>
      <PageHeader
        title="Users"
        subtitle="Who can sign in, and what each role may do."
        actions={
          <Button variant="contained" startIcon={<PersonAddOutlined />} onClick={() => setCreating(true)}>
            New user
          </Button>
        }
      />
      <DataTable
        label="Users"
        columns={columns}
        data={users.data?.items}
        total={users.data?.total ?? 0}
        page={table.page}
        pageSize={table.pageSize}
        sort={table.sort}
        onPageChange={table.onPageChange}
        onPageSizeChange={table.onPageSizeChange}
        onSortChange={table.onSortChange}
        loading={users.isLoading}
        error={users.error}
        onRetry={() => users.refetch()}
        rowId={(u) => u.id}
      />
      <CreateUserDialog open={creating} onClose={() => setCreating(false)} />
    </>
  );
}
