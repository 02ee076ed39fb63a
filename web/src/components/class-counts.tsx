import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { FindingClass } from 'ligament/engine';
import { FINDING_CLASSES, findingClassColours, findingClassLabels } from '@/lib/finding-classes';

const useStyles = makeStyles({
  list: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalXS,
    margin: 0,
    padding: 0,
    listStyleType: 'none',
  },
  chip: {
    display: 'inline-flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalXS,
    padding: `${tokens.spacingVerticalXXS} ${tokens.spacingHorizontalS}`,
    borderRadius: tokens.borderRadiusCircular,
    backgroundColor: tokens.colorNeutralBackground3,
    fontSize: tokens.fontSizeBase200,
  },
  swatch: { width: '8px', height: '8px', borderRadius: tokens.borderRadiusCircular },
  count: { fontWeight: tokens.fontWeightSemibold, fontVariantNumeric: 'tabular-nums' },
  none: { color: tokens.colorNeutralForeground3 },
});

export interface ClassCountsProps {
  readonly counts: Partial<Record<FindingClass, number>> | undefined;
  readonly emptyText?: string;
}

/** Non-zero counts per finding class, as labelled chips (name and number, colour only as a swatch). */
export function ClassCounts({ counts, emptyText = 'Nothing open' }: ClassCountsProps) {
  const styles = useStyles();
  const present = FINDING_CLASSES.filter((c) => (counts?.[c] ?? 0) > 0);
  if (present.length === 0)
    return (
      <Text size={200} className={styles.none}>
        {emptyText}
      </Text>
    );
  return (
    <ul className={styles.list} aria-label="Open findings by class">
      {present.map((c) => (
        <li key={c} className={styles.chip}>
          <span className={styles.swatch} style={{ backgroundColor: findingClassColours[c] }} aria-hidden />
          {findingClassLabels[c]} <span className={styles.count}>{counts?.[c]}</span>
        </li>
      ))}
    </ul>
  );
}
