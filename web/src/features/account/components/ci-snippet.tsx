import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { CopyRegular } from '@fluentui/react-icons';
import { useState } from 'react';

const useStyles = makeStyles({
  wrap: { position: 'relative' },
  pre: {
    margin: 0,
    padding: tokens.spacingHorizontalM,
    paddingRight: '96px',
    backgroundColor: tokens.colorNeutralBackground3,
    borderRadius: tokens.borderRadiusMedium,
    fontFamily: tokens.fontFamilyMonospace,
    fontSize: tokens.fontSizeBase200,
    overflowX: 'auto',
    whiteSpace: 'pre',
  },
  copy: { position: 'absolute', top: tokens.spacingVerticalS, right: tokens.spacingHorizontalS },
});

export interface CiSnippetProps {
  readonly serverUrl: string;
  readonly projectId: number;
  /** The secret when it has just been created; otherwise a placeholder variable name. */
  readonly token?: string;
}

/** The CI step to paste: check the calc files, then submit them to this project. */
export function ciSnippet({ serverUrl, projectId, token }: CiSnippetProps): string {
  return [
    '# Check every calc file; fail the build on an overstated claim, write SARIF for code review.',
    'npx ligament check --format sarif --fail-on overstated calc/**/*.json > ligament.sarif',
    '',
    '# Send the files to the checker as a new submittal.',
    `npx ligament submit --server ${serverUrl} --token ${token ?? '"$LIGAMENT_TOKEN"'} --project ${projectId} calc/**/*.json`,
  ].join('\n');
}

export function CiSnippet(props: CiSnippetProps) {
  const styles = useStyles();
  const [copied, setCopied] = useState(false);
  const text = ciSnippet(props);
  return (
    <div className={styles.wrap}>
      <pre className={styles.pre} aria-label="CI snippet" tabIndex={0}>
        {text}
      </pre>
      <Button
        className={styles.copy}
        size="small"
        icon={<CopyRegular />}
        onClick={() => {
          void navigator.clipboard?.writeText(text).then(() => setCopied(true));
        }}
      >
        {copied ? 'Copied' : 'Copy'}
      </Button>
      {!props.token && (
        <Text size={200}>Store the token as a CI secret named LIGAMENT_TOKEN; never commit it.</Text>
      )}
    </div>
  );
}
