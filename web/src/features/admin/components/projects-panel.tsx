import {
  Button,
  Dropdown,
  Field,
  Input,
  makeStyles,
  Option,
  Subtitle2,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  tokens,
} from '@fluentui/react-components';
import { useState } from 'react';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { useChangeProjectMembers } from '../api/change-project-members';
import { createProjectInputSchema, useCreateProject } from '../api/create-project';
import { useAdminProjects } from '../api/get-admin-projects';
import { useOrganisations } from '../api/get-organisations';
import { useProjectMembers } from '../api/get-project-members';
import { useUsers } from '../api/get-users';

const useStyles = makeStyles({
  form: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(180px, 1fr))',
    gap: tokens.spacingHorizontalM,
    alignItems: 'end',
    marginBottom: tokens.spacingVerticalL,
  },
  columns: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr) minmax(0, 1fr)',
    gap: tokens.spacingHorizontalL,
    '@media (max-width: 1000px)': { gridTemplateColumns: '1fr' },
  },
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
  if (members.isPending) return <LoadingState label="Loading members…" />;
  if (members.isError) return <ErrorState error={members.error} />;
  const candidates = (users.data ?? []).filter((u) => !members.data.some((m) => m.id === u.id));
  return (
    <>
      <Table size="small" aria-label="Project members">
        <TableHeader>
          <TableRow>
            <TableHeaderCell>Member</TableHeaderCell>
            <TableHeaderCell>Role</TableHeaderCell>
            <TableHeaderCell />
          </TableRow>
        </TableHeader>
        <TableBody>
          {members.data.map((m) => (
            <TableRow key={m.id}>
              <TableCell>{m.name}</TableCell>
              <TableCell>{m.role}</TableCell>
              <TableCell>
                <Button
                  size="small"
                  onClick={() => change.mutate({ userId: m.id, change: 'remove' })}
                  aria-label={`Remove ${m.name}`}
                >
                  Remove
                </Button>
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
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
                {u.name} ({u.role})
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
    </>
  );
}

export function ProjectsPanel() {
  const styles = useStyles();
  const projects = useAdminProjects();
  const organisations = useOrganisations();
  const create = useCreateProject();
  const [name, setName] = useState('');
  const [reference, setReference] = useState('');
  const [owner, setOwner] = useState<number | undefined>();
  const [error, setError] = useState<string | undefined>();
  const [selected, setSelected] = useState<number | undefined>();

  const submit = () => {
    const parsed = createProjectInputSchema.safeParse({
      name,
      reference: reference || undefined,
      ownerOrganisationId: owner,
    });
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message);
      return;
    }
    setError(undefined);
    create.mutate(parsed.data, {
      onSuccess: (p) => {
        setName('');
        setReference('');
        setSelected(p.id);
      },
    });
  };

  const current = selected ?? projects.data?.[0]?.id;
  return (
    <>
      <div className={styles.form}>
        <Field label="New project name" required validationMessage={error}>
          <Input value={name} onChange={(_, d) => setName(d.value)} />
        </Field>
        <Field label="Reference">
          <Input value={reference} onChange={(_, d) => setReference(d.value)} />
        </Field>
        <Field label="Owner">
          <Dropdown
            placeholder="None"
            value={organisations.data?.find((o) => o.id === owner)?.name ?? ''}
            selectedOptions={owner ? [String(owner)] : []}
            onOptionSelect={(_, d) => setOwner(d.optionValue ? Number(d.optionValue) : undefined)}
          >
            {(organisations.data ?? []).map((o) => (
              <Option key={o.id} value={String(o.id)}>
                {o.name}
              </Option>
            ))}
          </Dropdown>
        </Field>
        <Button appearance="primary" onClick={submit} disabled={create.isPending}>
          Create project
        </Button>
      </div>
      {projects.isPending ? (
        <LoadingState />
      ) : projects.isError ? (
        <ErrorState error={projects.error} />
      ) : projects.data.length === 0 ? (
        <EmptyState title="No projects yet" />
      ) : (
        <div className={styles.columns}>
          <Table aria-label="Projects">
            <TableHeader>
              <TableRow>
                <TableHeaderCell>Project</TableHeaderCell>
                <TableHeaderCell>Submittals</TableHeaderCell>
                <TableHeaderCell>Open</TableHeaderCell>
                <TableHeaderCell />
              </TableRow>
            </TableHeader>
            <TableBody>
              {projects.data.map((p) => (
                <TableRow key={p.id} aria-selected={p.id === current}>
                  <TableCell>
                    {p.name}
                    {p.reference ? <Text size={200}> · {p.reference}</Text> : null}
                  </TableCell>
                  <TableCell>{p.submittalCount}</TableCell>
                  <TableCell>{p.openDiscrepancyCount}</TableCell>
                  <TableCell>
                    <Button
                      size="small"
                      appearance={p.id === current ? 'primary' : 'secondary'}
                      onClick={() => setSelected(p.id)}
                    >
                      Members
                    </Button>
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
          {current !== undefined && (
            <div>
              <Subtitle2 as="h3">Members of {projects.data.find((p) => p.id === current)?.name}</Subtitle2>
              <MembersEditor key={current} projectId={current} />
            </div>
          )}
        </div>
      )}
    </>
  );
}
