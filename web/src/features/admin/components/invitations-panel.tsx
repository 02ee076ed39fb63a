import { Field, Input } from '@fluentui/react-components';
import { useState } from 'react';
import type { Schema } from '@/lib/api-schemas';
import { formatDateTime } from '@/lib/format';
import {
  createInvitationInputSchema,
  useCreateInvitation,
  type CreateInvitationInput,
} from '../api/create-invitation';
import { useInvitations } from '../api/get-invitations';
import { useOrganisations } from '../api/get-organisations';
import { AdminForm, issuesByField, OrganisationField, RoleDropdown } from './admin-form';
import { AdminTable, type AdminColumn } from './admin-table';

type Invitation = Schema<'InvitationDto'>;

function invitationState(i: Invitation): string {
  if (i.acceptedAt) return `accepted ${formatDateTime(i.acceptedAt)}`;
  return new Date(i.expiresAt) < new Date() ? 'expired' : `waiting, until ${formatDateTime(i.expiresAt)}`;
}

const columns: AdminColumn<Invitation>[] = [
  { id: 'name', header: 'Name', cell: (i) => i.name },
  { id: 'email', header: 'E-mail', cell: (i) => i.email },
  { id: 'role', header: 'Role', cell: (i) => i.role },
  { id: 'sent', header: 'Sent', cell: (i) => formatDateTime(i.createdAt) },
  { id: 'state', header: 'State', cell: invitationState },
];

export function InvitationsPanel() {
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
      setErrors(issuesByField(parsed.error));
      return;
    }
    setErrors({});
    create.mutate(parsed.data, { onSuccess: () => setForm({ email: '', name: '', role: form.role }) });
  };

  return (
    <>
      <AdminForm
        label="Invite someone"
        submitLabel="Send invitation"
        pending={create.isPending}
        onSubmit={submit}
      >
        <Field label="Name" required validationMessage={errors.name}>
          <Input value={form.name} onChange={(_, d) => setForm({ ...form, name: d.value })} />
        </Field>
        <Field label="E-mail" required validationMessage={errors.email}>
          <Input type="email" value={form.email} onChange={(_, d) => setForm({ ...form, email: d.value })} />
        </Field>
        <Field label="Role" required>
          <RoleDropdown value={form.role} onChange={(role) => setForm({ ...form, role })} />
        </Field>
        <OrganisationField
          label="Firm"
          organisations={organisations.data}
          value={form.organisationId}
          onChange={(organisationId) => setForm({ ...form, organisationId })}
        />
      </AdminForm>
      <AdminTable
        query={invitations}
        label="Invitations"
        columns={columns}
        rowKey={(i) => i.id}
        emptyTitle="No invitations sent"
      />
    </>
  );
}
