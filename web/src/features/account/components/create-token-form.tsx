import {
  Button,
  Dropdown,
  Field,
  Input,
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Option,
  Text,
  tokens,
} from '@fluentui/react-components';
import { CopyRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import type { Schema } from '@/lib/api-schemas';
import { createTokenInputSchema, useCreateToken } from '../api/create-token';
import { CiSnippet, TOKEN_VARIABLE } from './ci-snippet';

const useStyles = makeStyles({
  form: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 2fr) minmax(0, 2fr) auto',
    gap: tokens.spacingHorizontalM,
    alignItems: 'end',
    '@media (max-width: 900px)': { gridTemplateColumns: '1fr' },
  },
  secret: {
    fontFamily: tokens.fontFamilyMonospace,
    fontSize: tokens.fontSizeBase300,
    wordBreak: 'break-all',
    userSelect: 'all',
  },
  secretRow: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
  },
  shown: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    marginTop: tokens.spacingVerticalM,
  },
});

export interface CreateTokenFormProps {
  readonly projects: readonly Schema<'ProjectDto'>[];
  readonly serverUrl: string;
}

/** Creates a token for one project; the secret is shown once, with the CI snippet that uses it. */
export function CreateTokenForm({ projects, serverUrl }: CreateTokenFormProps) {
  const styles = useStyles();
  const [name, setName] = useState('');
  const [projectId, setProjectId] = useState<number | undefined>(projects[0]?.id);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const create = useCreateToken();
  const [copiedToken, setCopiedToken] = useState<string | null>(null);

  const submit = () => {
    const parsed = createTokenInputSchema.safeParse({ name, projectId });
    if (!parsed.success) {
      const next: Record<string, string> = {};
      for (const issue of parsed.error.issues) next[String(issue.path[0])] ??= issue.message;
      setErrors(next);
      return;
    }
    setErrors({});
    create.mutate(parsed.data, { onSuccess: () => setName('') });
  };

  return (
    <div>
      <div className={styles.form}>
        <Field label="Token name" required validationMessage={errors.name}>
          <Input
            value={name}
            onChange={(_, d) => setName(d.value)}
            placeholder="e.g. CI — harbour-lantern repository"
          />
        </Field>
        <Field label="Project" required validationMessage={errors.projectId}>
          <Dropdown
            value={projects.find((p) => p.id === projectId)?.name ?? ''}
            selectedOptions={projectId ? [String(projectId)] : []}
            onOptionSelect={(_, d) => setProjectId(d.optionValue ? Number(d.optionValue) : undefined)}
          >
            {projects.map((p) => (
              <Option key={p.id} value={String(p.id)}>
                {p.name}
              </Option>
            ))}
          </Dropdown>
        </Field>
        <Button appearance="primary" onClick={submit} disabled={create.isPending}>
          {create.isPending ? 'Creating…' : 'Create token'}
        </Button>
      </div>
      {create.data && (
        <div className={styles.shown} data-testid="new-token">
          <MessageBar intent="warning" layout="multiline">
            <MessageBarBody>
              <MessageBarTitle>Copy the token now — it is shown only this once.</MessageBarTitle>
              Ligament keeps only its fingerprint. If you lose it, revoke it and make another.
            </MessageBarBody>
          </MessageBar>
          <div className={styles.secretRow}>
            <Text className={styles.secret} aria-label="New token">
              {create.data.token}
            </Text>
            <Button
              icon={<CopyRegular />}
              onClick={() => {
                const secret = create.data.token;
                void navigator.clipboard?.writeText(secret).then(() => setCopiedToken(secret));
              }}
            >
              {copiedToken === create.data.token ? 'Token copied' : 'Copy token'}
            </Button>
          </div>
          <Text>
            Save it in your CI settings as a masked secret variable named <code>{TOKEN_VARIABLE}</code>, then
            add this step to the CI job (it reads the variable; the token is not in it):
          </Text>
          <CiSnippet serverUrl={serverUrl} projectId={create.data.projectId} />
        </div>
      )}
    </div>
  );
}
