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
  ProgressBar,
  tokens,
} from '@fluentui/react-components';
import type { CalcError } from 'ligament/calc';
import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { Section } from '@/components/section';
import { ErrorState, LoadingState } from '@/components/states';
import { ApiError, describeError } from '@/lib/api-error';
import { useUploadContext } from '../api/get-upload-context';
import { uploadInputSchema, useUploadSubmittal } from '../api/upload-submittal';
import { CalcDropZone } from '../components/calc-drop-zone';
import { FileCheckList, type CheckedFile } from '../components/file-check-list';
import { UploadSummary } from '../components/upload-summary';
import { validateCalcFile } from '../components/validate-calc-file';

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  row: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 2fr) minmax(0, 1fr)',
    gap: tokens.spacingHorizontalL,
    '@media (max-width: 900px)': { gridTemplateColumns: '1fr' },
  },
  actions: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
  serverErrors: {
    margin: 0,
    paddingLeft: tokens.spacingHorizontalXL,
    fontFamily: tokens.fontFamilyMonospace,
    fontSize: tokens.fontSizeBase200,
  },
});

let nextKey = 0;

function isCalcError(value: unknown): value is CalcError {
  return (
    typeof value === 'object' && value !== null && 'pointer' in value && 'rule' in value && 'line' in value
  );
}

export function Component() {
  const styles = useStyles();
  const projectId = Number(useParams().projectId);
  const context = useUploadContext(projectId);
  const [files, setFiles] = useState<CheckedFile[]>([]);
  const [title, setTitle] = useState('');
  const [revisionOf, setRevisionOf] = useState<number | undefined>(undefined);
  const [progress, setProgress] = useState(0);
  const [formError, setFormError] = useState<string | null>(null);
  const upload = useUploadSubmittal(projectId, setProgress);

  const addFiles = (incoming: File[]) => {
    upload.reset();
    const added = incoming.map((file) => ({
      key: `f${nextKey++}`,
      file,
      check: { state: 'checking' } as const,
    }));
    setFiles((current) => [
      ...current.filter((c) => !incoming.some((f) => f.name === c.file.name)),
      ...added,
    ]);
    for (const item of added) {
      void validateCalcFile(item.file)
        .catch((error: unknown) => ({
          state: 'invalid' as const,
          errors: [
            {
              file: item.file.name,
              pointer: '',
              line: 1,
              column: 1,
              rule: 'read',
              message: error instanceof Error ? `${error.name}: ${error.message}` : describeError(error),
            },
          ],
        }))
        .then((check) =>
          setFiles((current) => current.map((c) => (c.key === item.key ? { ...c, check } : c))),
        );
    }
  };

  const checking = files.some((f) => f.check.state === 'checking');
  const invalid = files.filter((f) => f.check.state === 'invalid').length;

  const submit = () => {
    const parsed = uploadInputSchema.safeParse({ title, revisionOf, files: files.map((f) => f.file) });
    if (!parsed.success) {
      setFormError(parsed.error.issues.map((i) => i.message).join(' '));
      return;
    }
    setFormError(null);
    setProgress(0);
    upload.mutate(parsed.data, { onSuccess: () => setFiles([]) });
  };

  if (context.isPending) return <LoadingState label="Loading the project…" />;
  if (context.isError) return <ErrorState error={context.error} onRetry={() => void context.refetch()} />;

  const serverErrors =
    upload.error instanceof ApiError && Array.isArray(upload.error.details)
      ? upload.error.details.filter(isCalcError)
      : [];

  return (
    <>
      <PageHeader
        eyebrow={context.data.project.name}
        title="Upload calc files"
        description="Every file is checked here first with the same loader the server runs; the server then recomputes every member."
      />
      <Section>
        <div className={styles.form}>
          <div className={styles.row}>
            <Field label="Submittal title" required>
              <Input
                value={title}
                onChange={(_, d) => setTitle(d.value)}
                placeholder="e.g. Deck splice plates, grid 3–5"
              />
            </Field>
            <Field label="Revision of" hint="Leave empty for a first issue.">
              <Dropdown
                placeholder="First issue"
                value={
                  revisionOf
                    ? `#${revisionOf} ${context.data.submittals.find((s) => s.id === revisionOf)?.title ?? ''}`
                    : ''
                }
                selectedOptions={revisionOf ? [String(revisionOf)] : []}
                onOptionSelect={(_, d) => setRevisionOf(d.optionValue ? Number(d.optionValue) : undefined)}
              >
                <Option value="" text="First issue">
                  First issue
                </Option>
                {context.data.submittals.map((s) => (
                  <Option key={s.id} value={String(s.id)} text={`#${s.id} ${s.title}`}>
                    {`#${s.id} ${s.title}`}
                  </Option>
                ))}
              </Dropdown>
            </Field>
          </div>
          <CalcDropZone onFiles={addFiles} disabled={upload.isPending} />
          {files.length > 0 && (
            <FileCheckList
              files={files}
              onRemove={(key) => setFiles((current) => current.filter((c) => c.key !== key))}
              disabled={upload.isPending}
            />
          )}
          {upload.isPending && (
            <Field
              label="Uploading"
              validationMessage={
                progress < 1 ? `${Math.round(progress * 100)} % sent` : 'Sent; the server is recomputing…'
              }
              validationState="none"
            >
              <ProgressBar
                value={progress < 1 ? progress : undefined}
                thickness="large"
                aria-label="Upload progress"
              />
            </Field>
          )}
          {formError && (
            <MessageBar intent="error" role="alert">
              <MessageBarBody>{formError}</MessageBarBody>
            </MessageBar>
          )}
          {upload.isError && (
            <MessageBar intent="error" role="alert" layout="multiline">
              <MessageBarBody>
                <MessageBarTitle>The server refused the upload; nothing was stored.</MessageBarTitle>
                {describeError(upload.error)}
                {serverErrors.length > 0 && (
                  <ol className={styles.serverErrors}>
                    {serverErrors.map((e, i) => (
                      <li key={i}>
                        {e.file}: line {e.line}, column {e.column} · {e.pointer || '(document)'} · {e.rule} —{' '}
                        {e.message}
                      </li>
                    ))}
                  </ol>
                )}
              </MessageBarBody>
            </MessageBar>
          )}
          <div className={styles.actions}>
            <Button
              appearance="primary"
              size="large"
              onClick={submit}
              disabled={upload.isPending || checking || invalid > 0 || files.length === 0}
            >
              {upload.isPending
                ? 'Uploading…'
                : `Upload ${files.length || ''} file${files.length === 1 ? '' : 's'} and check`}
            </Button>
            {invalid > 0 && (
              <span>
                Remove or fix the {invalid} invalid file{invalid === 1 ? '' : 's'} first.
              </span>
            )}
            {checking && <span>Checking files…</span>}
          </div>
          {upload.data && <UploadSummary result={upload.data} />}
        </div>
      </Section>
    </>
  );
}
