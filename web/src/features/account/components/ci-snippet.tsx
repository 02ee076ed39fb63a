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
}

/** The CI variable the snippet reads the token from; the secret itself never goes into the snippet. */
export const TOKEN_VARIABLE = 'LIGAMENT_TOKEN';

/**
 * The CI step to paste: check the calc files, then submit them to this project. The glob is quoted
 * so the CLI expands it (the same on every shell, `**` included) and the token comes from a CI secret.
 */
export function ciSnippet({ serverUrl, projectId }: CiSnippetProps): string {
  return [
    '# Install the ligament tarball kept in the repository (made with npm pack -w cli; not on the npm registry).',
    'npm install --no-save ./tools/ligament-0.1.0.tgz',
    '',
    '# Check every calc file; fail the build on an overstated claim, write SARIF for code review.',
    "npx ligament check --format sarif --fail-on overstated 'calc/**/*.json' > ligament.sarif",
    '',
    '# Send the files to the checker as a new submittal.',
    `npx ligament submit --server ${serverUrl} --token "$${TOKEN_VARIABLE}" --project ${projectId} 'calc/**/*.json'`,
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
        {copied ? 'Copied' : 'Copy snippet'}
      </Button>
      <Text size={200}>
        Store the token as a masked CI secret variable named {TOKEN_VARIABLE}; never commit it.
      </Text>
    </div>
  );
}
