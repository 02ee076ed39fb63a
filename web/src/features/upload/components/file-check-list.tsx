import { Button, makeStyles, Spinner, Text, tokens } from '@fluentui/react-components';
import { CheckmarkCircleFilled, DismissRegular, ErrorCircleFilled } from '@fluentui/react-icons';
import type { FileCheck } from './validate-calc-file';

const useStyles = makeStyles({
  list: {
    listStyleType: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
  },
  item: {
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
  },
  head: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  name: { flexGrow: 1, fontWeight: tokens.fontWeightSemibold, wordBreak: 'break-all' },
  ok: { color: tokens.colorPaletteGreenForeground1 },
  bad: { color: tokens.colorPaletteRedForeground1 },
  errors: {
    margin: `${tokens.spacingVerticalXS} 0 0`,
    paddingLeft: tokens.spacingHorizontalXL,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
  },
  where: {
    fontFamily: tokens.fontFamilyMonospace,
    fontSize: tokens.fontSizeBase200,
    color: tokens.colorNeutralForeground2,
  },
});

export interface CheckedFile {
  readonly key: string;
  readonly file: File;
  readonly check: FileCheck;
}

export interface FileCheckListProps {
  readonly files: readonly CheckedFile[];
  readonly onRemove: (key: string) => void;
  readonly disabled?: boolean;
}

/** One row per chosen file: its state in words and icon, and every error with line, column, pointer and rule. */
export function FileCheckList({ files, onRemove, disabled = false }: FileCheckListProps) {
  const styles = useStyles();
  return (
    <ul className={styles.list} aria-label="Chosen files">
      {files.map(({ key, file, check }) => (
        <li key={key} className={styles.item} data-testid="file-check">
          <div className={styles.head}>
            {check.state === 'checking' && <Spinner size="tiny" aria-label="Checking" />}
            {check.state === 'valid' && <CheckmarkCircleFilled className={styles.ok} aria-hidden />}
            {check.state === 'invalid' && <ErrorCircleFilled className={styles.bad} aria-hidden />}
            <span className={styles.name}>{file.name}</span>
            <Text size={200}>
              {check.state === 'checking' && 'Checking…'}
              {check.state === 'valid' &&
                `Valid · ${check.members.length} member${check.members.length === 1 ? '' : 's'} (${check.members.join(', ')}) · ${check.units}`}
              {check.state === 'invalid' &&
                `${check.errors.length} error${check.errors.length === 1 ? '' : 's'} — fix before uploading`}
            </Text>
            <Button
              appearance="subtle"
              size="small"
              icon={<DismissRegular />}
              aria-label={`Remove ${file.name}`}
              disabled={disabled}
              onClick={() => onRemove(key)}
            />
          </div>
          {check.state === 'invalid' && (
            <ol className={styles.errors}>
              {check.errors.map((error, index) => (
                <li key={index}>
                  <Text size={200}>
                    <span className={styles.where}>
                      line {error.line}, column {error.column} · {error.pointer || '(document)'} ·{' '}
                      {error.rule}
                    </span>{' '}
                    — {error.message}
                  </Text>
                </li>
              ))}
            </ol>
          )}
        </li>
      ))}
    </ul>
  );
}
