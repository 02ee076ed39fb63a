import {
  Dropdown,
  makeStyles,
  Option,
  Switch,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
} from '@fluentui/react-components';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { useUsers } from '../api/get-users';
import { useUpdateUser } from '../api/update-user';
import { ROLE_OPTIONS } from './roles';

const useStyles = makeStyles({ wrap: { overflowX: 'auto' } });

export function UsersPanel() {
  const styles = useStyles();
  const users = useUsers();
  const update = useUpdateUser();
  if (users.isPending) return <LoadingState label="Loading users…" />;
  if (users.isError) return <ErrorState error={users.error} onRetry={() => void users.refetch()} />;
  if (users.data.length === 0) return <EmptyState title="No users" />;
  return (
    <div className={styles.wrap}>
      <Table aria-label="Users">
        <TableHeader>
          <TableRow>
            <TableHeaderCell>Name</TableHeaderCell>
            <TableHeaderCell>E-mail</TableHeaderCell>
            <TableHeaderCell>Firm</TableHeaderCell>
            <TableHeaderCell>Role</TableHeaderCell>
            <TableHeaderCell>Active</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {users.data.map((u) => (
            <TableRow key={u.id}>
              <TableCell>{u.name}</TableCell>
              <TableCell>{u.email}</TableCell>
              <TableCell>{u.organisation?.name ?? '—'}</TableCell>
              <TableCell>
                <Dropdown
                  aria-label={`Role of ${u.name}`}
                  value={ROLE_OPTIONS.find((r) => r.value === u.role)?.label ?? u.role}
                  selectedOptions={[u.role]}
                  onOptionSelect={(_, d) =>
                    d.optionValue &&
                    d.optionValue !== u.role &&
                    update.mutate({ userId: u.id, input: { role: d.optionValue as typeof u.role } })
                  }
                >
                  {ROLE_OPTIONS.map((r) => (
                    <Option key={r.value} value={r.value}>
                      {r.label}
                    </Option>
                  ))}
                </Dropdown>
              </TableCell>
              <TableCell>
                <Switch
                  checked={u.active}
                  label={u.active ? 'Active' : 'Inactive'}
                  aria-label={`${u.name} active`}
                  onChange={(_, d) => update.mutate({ userId: u.id, input: { active: d.checked } })}
                />
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </div>
  );
}
