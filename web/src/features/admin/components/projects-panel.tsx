import {
  Button,
  Dropdown,
  Field,
  Input,
  makeStyles,
  Option,
  Subtitle2,
  Text,
  tokens,
} from '@fluentui/react-components';
import { useState } from 'react';
import type { Schema } from '@/lib/api-schemas';
import { roleLabel } from '@/lib/roles';
import { useChangeProjectMembers } from '../api/change-project-members';
import { createProjectInputSchema, useCreateProject } from '../api/create-project';
import { useAdminProjects } from '../api/get-admin-projects';
import { useOrganisations } from '../api/get-organisations';
import { useProjectMembers } from '../api/get-project-members';
import { useUsers } from '../api/get-users';
import { AdminForm, issuesByField, OrganisationField } from './admin-form';
import { AdminTable, type AdminColumn } from './admin-table';

type Project = Schema<'ProjectDto'>;
type Member = Schema<'ProjectMemberDto'>;

const useStyles = makeStyles({
  add: {
    display: 'flex',
    gap: tokens.spacingHorizontalS,
    alignItems: 'end',
    marginTop: tokens.spacingVerticalM,
    flexWrap: 'wrap',
  },
});

function MembersEditor({ projectId }: { projectId: number }) {
  const styles = useStyles();
  const members = useProjectMembers(projectId);
  const users = useUsers();
  const change = useChangeProjectMembers(projectId);
  const [userId, setUserId] = useState<number | undefined>();
  const columns: AdminColumn<Member>[] = [
    { id: 'member', header: 'Member', cell: (m) => m.name },
    { id: 'role', header: 'Role', cell: (m) => roleLabel(m.role) },
    {
      id: 'remove',
      header: 'Remove',
      hideHeader: true,
      cell: (m) => (
        <Button
          size="small"
          onClick={() => change.mutate({ userId: m.id, change: 'remove' })}
          aria-label={`Remove ${m.name}`}
        >
          Remove
        </Button>
      ),
    },
  ];
  const candidates = (users.data ?? []).filter((u) => !members.data?.some((m) => m.id === u.id));
  return (
    <>
      <AdminTable
        query={members}
        label="Project members"
        columns={columns}
        rowKey={(m) => m.id}
        size="small"
        loadingLabel="Loading members…"
      />
      {members.data && (
        <div className={styles.add}>
          <Field label="Add a member">
            <Dropdown
              placeholder="Choose a user"
              value={candidates.find((u) => u.id === userId)?.name ?? ''}
              selectedOptions={userId ? [String(userId)] : []}
              onOptionSelect={(_, d) => setUserId(d.optionValue ? Number(d.optionValue) : undefined)}
            >
              {candidates.map((u) => (
                <Option key={u.id} value={String(u.id)} text={u.name}>
                  {u.name} ({roleLabel(u.role)})
                </Option>
              ))}
            </Dropdown>
          </Field>
          <Button
            disabled={!userId || change.isPending}
            onClick={() =>
              userId && change.mutate({ userId, change: 'add' }, { onSuccess: () => setUserId(undefined) })
            }
          >
            Add
          </Button>
        </div>
      )}
    </>
  );
}

export function ProjectsPanel() {
  const projects = useAdminProjects();
  const organisations = useOrganisations();
  const create = useCreateProject();
  const [name, setName] = useState('');
  const [reference, setReference] = useState('');
  const [owner, setOwner] = useState<number | undefined>();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [selected, setSelected] = useState<number | undefined>();

  const submit = () => {
    const parsed = createProjectInputSchema.safeParse({
      name,
      reference: reference || undefined,
      ownerOrganisationId: owner,
    });
    if (!parsed.success) {
      setErrors(issuesByField(parsed.error));
      return;
    }
    setErrors({});
    create.mutate(parsed.data, {
      onSuccess: (p) => {
        setName('');
        setReference('');
        setSelected(p.id);
      },
    });
  };

  const current = selected ?? projects.data?.[0]?.id;
  const columns: AdminColumn<Project>[] = [
    {
      id: 'project',
      header: 'Project',
      cell: (p) => (
        <>
          {p.name}
          {p.reference ? <Text size={200}> · {p.reference}</Text> : null}
        </>
      ),
    },
    { id: 'submittals', header: 'Submittals', cell: (p) => p.submittalCount },
    { id: 'open', header: 'Open', cell: (p) => p.openDiscrepancyCount },
    {
      id: 'members',
      header: 'Members',
      hideHeader: true,
      cell: (p) => (
        <Button
          size="small"
          appearance={p.id === current ? 'primary' : 'secondary'}
          aria-pressed={p.id === current}
          onClick={() => setSelected(p.id)}
        >
          Members
        </Button>
      ),
    },
  ];
  return (
    <>
      <AdminForm
        label="New project"
        submitLabel="Create project"
        pending={create.isPending}
        onSubmit={submit}
      >
        <Field label="New project name" required validationMessage={errors.name}>
          <Input value={name} onChange={(_, d) => setName(d.value)} />
        </Field>
        <Field label="Reference" validationMessage={errors.reference}>
          <Input value={reference} onChange={(_, d) => setReference(d.value)} />
        </Field>
        <OrganisationField
          label="Owner"
          organisations={organisations.data}
          value={owner}
          onChange={setOwner}
        />
      </AdminForm>
      <AdminTable
        query={projects}
        label="Projects"
        columns={columns}
        rowKey={(p) => p.id}
        emptyTitle="No projects yet"
        isSelected={(p) => p.id === current}
        aside={(rows) =>
          current !== undefined && (
            <div>
              <Subtitle2 as="h3">Members of {rows.find((p) => p.id === current)?.name}</Subtitle2>
              <MembersEditor key={current} projectId={current} />
            </div>
          )
        }
      />
    </>
  );
}
