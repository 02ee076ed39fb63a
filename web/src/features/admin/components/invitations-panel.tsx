import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  DialogTrigger,
  Field,
  Input,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useState } from 'react';
import type { Schema } from '@/lib/api-schemas';
import { formatDateTime } from '@/lib/format';
import { roleLabel } from '@/lib/roles';
import {
  createInvitationInputSchema,
  useCreateInvitation,
  type CreateInvitationInput,
} from '../api/create-invitation';
import { useInvitations } from '../api/get-invitations';
import { useOrganisations } from '../api/get-organisations';
import { useResendInvitation } from '../api/resend-invitation';
import { useRevokeInvitation } from '../api/revoke-invitation';
import { AdminForm, issuesByField, OrganisationField, RoleDropdown } from './admin-form';
import { AdminTable, type AdminColumn } from './admin-table';

type Invitation = Schema<'InvitationDto'>;

const useStyles = makeStyles({
  actions: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS },
});

/** Where an invitation stands, in words, with the date that matters. */
function invitationState(i: Invitation): string {
  switch (i.state) {
    case 'accepted':
      return `Accepted ${formatDateTime(i.acceptedAt ?? i.createdAt)}`;
    case 'revoked':
      return `Revoked ${formatDateTime(i.revokedAt ?? i.createdAt)}`;
    case 'replaced':
      return 'Sent again with a new link';
    case 'expired':
      return `Expired ${formatDateTime(i.expiresAt)}`;
    case 'waiting':
      return `Waiting, until ${formatDateTime(i.expiresAt)}`;
  }
}

/** Send again (a new link) and revoke, for an invitation that is still open. */
function InvitationActions({ invitation }: { invitation: Invitation }) {
  const styles = useStyles();
  const resend = useResendInvitation();
  const revoke = useRevokeInvitation();
  const [confirming, setConfirming] = useState(false);
  if (invitation.state !== 'waiting' && invitation.state !== 'expired') return null;
  const busy = resend.isPending || revoke.isPending;
  return (
    <div className={styles.actions}>
      <Button
        size="small"
        disabled={busy}
        onClick={() => resend.mutate(invitation.id)}
        aria-label={`Send the invitation to ${invitation.email} again with a new link`}
      >
        Send again
      </Button>
      <Dialog open={confirming} onOpenChange={(_, d) => setConfirming(d.open)}>
        <DialogTrigger disableButtonEnhancement>
          <Button size="small" disabled={busy} aria-label={`Revoke the invitation to ${invitation.email}`}>
            Revoke
          </Button>
        </DialogTrigger>
        <DialogSurface>
          <DialogBody>
            <DialogTitle>Revoke the invitation to {invitation.name}?</DialogTitle>
            <DialogContent>
              The link sent to {invitation.email} stops working at once. You can invite them again later.
            </DialogContent>
            <DialogActions>
              <DialogTrigger disableButtonEnhancement>
                <Button>Keep it</Button>
              </DialogTrigger>
              <Button
                appearance="primary"
                onClick={() => revoke.mutate(invitation.id, { onSettled: () => setConfirming(false) })}
              >
                Revoke invitation
              </Button>
            </DialogActions>
          </DialogBody>
        </DialogSurface>
      </Dialog>
    </div>
  );
}

const columns: AdminColumn<Invitation>[] = [
  { id: 'name', header: 'Name', cell: (i) => i.name },
  { id: 'email', header: 'E-mail', cell: (i) => i.email },
  { id: 'role', header: 'Role', cell: (i) => roleLabel(i.role) },
  { id: 'sent', header: 'Sent', cell: (i) => formatDateTime(i.createdAt) },
  { id: 'state', header: 'State', cell: invitationState },
  { id: 'actions', header: 'Actions', hideHeader: true, cell: (i) => <InvitationActions invitation={i} /> },
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
