import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { describeChange, type DocumentChange } from './describe-change';

const useStyles = makeStyles({
  list: {
    listStyleType: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
  },
  item: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'baseline',
    columnGap: tokens.spacingHorizontalS,
    rowGap: tokens.spacingVerticalXXS,
    padding: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalS}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground2,
  },
  subject: { fontWeight: tokens.fontWeightSemibold },
  verb: {
    fontSize: tokens.fontSizeBase200,
    textTransform: 'uppercase',
    letterSpacing: '0.04em',
    color: tokens.colorNeutralForeground2,
  },
  // Struck through and underlined as well as tinted: the old and new values do not rely on colour.
  before: { color: tokens.colorPaletteRedForeground1, textDecorationLine: 'line-through' },
  after: { color: tokens.colorPaletteGreenForeground1, textDecorationLine: 'underline' },
  values: { fontVariantNumeric: 'tabular-nums' },
});

export interface MeaningDiffViewProps {
  /** Changes by meaning from the API; null when the stored documents could not be compared. */
  readonly changes: readonly DocumentChange[] | null;
  readonly label: string;
}

/** The change between two calc files by meaning: member, hole or claim, and old → new with units. */
export function MeaningDiffView({ changes, label }: MeaningDiffViewProps) {
  const styles = useStyles();
  if (changes === null)
    return <Text>These files could not be compared by meaning; the text shows the change.</Text>;
  if (changes.length === 0) return <Text>No change in members, holes, claims or the code profile.</Text>;
  return (
    <ul className={styles.list} aria-label={label}>
      {changes.map((c, index) => {
        const words = describeChange(c);
        return (
          <li key={index} className={styles.item} data-testid="meaning-change">
            <span className={styles.subject}>{words.subject}</span>
            <span className={styles.verb}>{words.verb}</span>
            <span className={styles.values}>
              {words.before !== undefined && <del className={styles.before}>{words.before}</del>}
              {words.before !== undefined && words.after !== undefined && ' → '}
              {words.after !== undefined && <ins className={styles.after}>{words.after}</ins>}
            </span>
          </li>
        );
      })}
    </ul>
  );
}
