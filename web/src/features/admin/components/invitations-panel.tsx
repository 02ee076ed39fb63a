import {
  Button,
  Dropdown,
  Field,
  Input,
  makeStyles,
  Option,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  tokens,
} from '@fluentui/react-components';
import { useState } from 'react';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { formatDateTime } from '@/lib/format';
import {
  createInvitationInputSchema,
  useCreateInvitation,
  type CreateInvitationInput,
} from '../api/create-invitation';
import { useInvitations } from '../api/get-invitations';
import { useOrganisations } from '../api/get-organisations';
import { ROLE_OPTIONS } from './roles';

const useStyles = makeStyles({
  form: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(180px, 1fr))',
    gap: tokens.spacingHorizontalM,
    alignItems: 'end',
    marginBottom: tokens.spacingVerticalL,
  },
  wrap: { overflowX: 'auto' },
});

export function InvitationsPanel() {
  const styles = useStyles();
  const invitations = useInvitations();
  const organisations = useOrganisations();
  const create = useCreateInvitation();
  const [form, setForm] = useState<{
    email: string;
    name: string;
    role: CreateInvitationInput['role'];
    organisationId?: number;
  }>({ email: '', name: '', role: 'consultant' });
  const [errors, setErrors] = useState<Record<string, string>>({});

  const submit = () => {
    const parsed = createInvitationInputSchema.safeParse(form);
    if (!parsed.success) {
      const next: Record<string, string> = {};
      for (const issue of parsed.error.issues) next[String(issue.path[0])] ??= issue.message;
      setErrors(next);
      return;
    }
    setErrors({});
    create.mutate(parsed.data, { onSuccess: () => setForm({ email: '', name: '', role: form.role }) });
  };

  return (
    <>
      <div className={styles.form}>
        <Field label="Name" required validationMessage={errors.name}>
          <Input value={form.name} onChange={(_, d) => setForm({ ...form, name: d.value })} />
        </Field>
        <Field label="E-mail" required validationMessage={errors.email}>
          <Input type="email" value={form.email} onChange={(_, d) => setForm({ ...form, email: d.value })} />
        </Field>
        <Field label="Role" required>
          <Dropdown
            value={ROLE_OPTIONS.find((r) => r.value === form.role)?.label ?? ''}
            selectedOptions={[form.role]}
            onOptionSelect={(_, d) =>
              setForm({ ...form, role: d.optionValue as CreateInvitationInput['role'] })
            }
          >
            {ROLE_OPTIONS.map((r) => (
              <Option key={r.value} value={r.value}>
                {r.label}
              </Option>
            ))}
          </Dropdown>
        </Field>
        <Field label="Firm">
          <Dropdown
            placeholder="None"
            value={organisations.data?.find((o) => o.id === form.organisationId)?.name ?? ''}
            selectedOptions={form.organisationId ? [String(form.organisationId)] : []}
            onOptionSelect={(_, d) =>
              setForm({ ...form, organisationId: d.optionValue ? Number(d.optionValue) : undefined })
            }
          >
            {(organisations.data ?? []).map((o) => (
              <Option key={o.id} value={String(o.id)}>
                {o.name}
              </Option>
            ))}
          </Dropdown>
        </Field>
        <Button appearance="primary" onClick={submit} disabled={create.isPending}>
          Send invitation
        </Button>
      </div>
      {invitations.isPending ? (
        <LoadingState />
      ) : invitations.isError ? (
        <ErrorState error={invitations.error} />
      ) : invitations.data.length === 0 ? (
        <EmptyState title="No invitations sent" />
      ) : (
        <div className={styles.wrap}>
          <Table aria-label="Invitations">
            <TableHeader>
              <TableRow>
                <TableHeaderCell>Name</TableHeaderCell>
                <TableHeaderCell>E-mail</TableHeaderCell>
                <TableHeaderCell>Role</TableHeaderCell>
                <TableHeaderCell>Sent</TableHeaderCell>
                <TableHeaderCell>State</TableHeaderCell>
              </TableRow>
            </TableHeader>
            <TableBody>
              {invitations.data.map((i) => (
                <TableRow key={i.id}>
                  <TableCell>{i.name}</TableCell>
                  <TableCell>{i.email}</TableCell>
                  <TableCell>{i.role}</TableCell>
                  <TableCell>{formatDateTime(i.createdAt)}</TableCell>
                  <TableCell>
                    {i.acceptedAt
                      ? `accepted ${formatDateTime(i.acceptedAt)}`
                      : new Date(i.expiresAt) < new Date()
                        ? 'expired'
                        : `waiting, until ${formatDateTime(i.expiresAt)}`}
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </div>
      )}
    </>
  );
}
