import { makeStyles, mergeClasses, Text, tokens } from '@fluentui/react-components';

const useStyles = makeStyles({
  wrap: {
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
    overflowX: 'auto',
    backgroundColor: tokens.colorNeutralBackground1,
    maxHeight: '520px',
    overflowY: 'auto',
  },
  pre: {
    margin: 0,
    fontFamily: tokens.fontFamilyMonospace,
    fontSize: tokens.fontSizeBase200,
    lineHeight: tokens.lineHeightBase300,
  },
  line: {
    display: 'block',
    paddingLeft: tokens.spacingHorizontalS,
    paddingRight: tokens.spacingHorizontalS,
    whiteSpace: 'pre',
  },
  added: { backgroundColor: tokens.colorPaletteGreenBackground1, color: tokens.colorPaletteGreenForeground1 },
  removed: { backgroundColor: tokens.colorPaletteRedBackground1, color: tokens.colorPaletteRedForeground1 },
  hunk: { backgroundColor: tokens.colorBrandBackground2, color: tokens.colorBrandForeground2 },
  meta: { color: tokens.colorNeutralForeground3 },
  stats: { display: 'block', marginBottom: tokens.spacingVerticalXS },
});

export interface CalcDiffViewProps {
  /** A unified diff of the two calc files (canonical JSON). */
  readonly patch: string;
  readonly label: string;
}

type Kind = 'added' | 'removed' | 'hunk' | 'meta' | 'context';

function kindOf(line: string): Kind {
  if (
    line.startsWith('+++') ||
    line.startsWith('---') ||
    line.startsWith('Index:') ||
    line.startsWith('====')
  )
    return 'meta';
  if (line.startsWith('@@')) return 'hunk';
  if (line.startsWith('+')) return 'added';
  if (line.startsWith('-')) return 'removed';
  return 'context';
}

/** A unified diff with added and removed lines tinted; the +/− sign stays in the text so colour is not the only cue. */
export function CalcDiffView({ patch, label }: CalcDiffViewProps) {
  const styles = useStyles();
  const lines = patch.replace(/\n$/, '').split('\n');
  const added = lines.filter((l) => kindOf(l) === 'added').length;
  const removed = lines.filter((l) => kindOf(l) === 'removed').length;
  return (
    <div>
      <Text size={200} className={styles.stats}>
        {added} line{added === 1 ? '' : 's'} added, {removed} removed
      </Text>
      <div className={styles.wrap} role="region" aria-label={label} tabIndex={0}>
        <pre className={styles.pre}>
          {lines.map((line, index) => {
            const kind = kindOf(line);
            return (
              <span key={index} className={mergeClasses(styles.line, kind !== 'context' && styles[kind])}>
                {line || ' '}
              </span>
            );
          })}
        </pre>
      </div>
    </div>
  );
}
