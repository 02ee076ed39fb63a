import { Switch } from '@fluentui/react-components';
import type { Schema } from '@/lib/api-schemas';
import { useUsers } from '../api/get-users';
import { useUpdateUser } from '../api/update-user';
import { RoleDropdown } from './admin-form';
import { AdminTable, type AdminColumn } from './admin-table';

type User = Schema<'UserDto'>;

export function UsersPanel() {
  const users = useUsers();
  const update = useUpdateUser();
  const columns: AdminColumn<User>[] = [
    { id: 'name', header: 'Name', cell: (u) => u.name },
    { id: 'email', header: 'E-mail', cell: (u) => u.email },
    { id: 'firm', header: 'Firm', cell: (u) => u.organisation?.name ?? '—' },
    {
      id: 'role',
      header: 'Role',
      cell: (u) => (
        <RoleDropdown
          aria-label={`Role of ${u.name}`}
          value={u.role}
          onChange={(role) => update.mutate({ userId: u.id, input: { role } })}
        />
      ),
    },
    {
      id: 'active',
      header: 'Active',
      cell: (u) => (
        <Switch
          checked={u.active}
          label={u.active ? 'Active' : 'Inactive'}
          aria-label={`${u.name} active`}
          onChange={(_, d) => update.mutate({ userId: u.id, input: { active: d.checked } })}
        />
      ),
    },
  ];
  return (
    <AdminTable
      query={users}
      label="Users"
      columns={columns}
      rowKey={(u) => u.id}
      emptyTitle="No users"
      loadingLabel="Loading users…"
    />
  );
}
