import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';

const useStyles = makeStyles({
  tile: {
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow2,
    padding: tokens.spacingHorizontalL,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
    borderTop: `4px solid ${tokens.colorBrandStroke1}`,
  },
  value: {
    fontSize: tokens.fontSizeHero800,
    lineHeight: tokens.lineHeightHero800,
    fontWeight: tokens.fontWeightSemibold,
    fontVariantNumeric: 'tabular-nums',
  },
});

export interface KpiTileProps {
  readonly label: string;
  readonly value: number | string;
  readonly detail?: ReactNode;
  readonly testId?: string;
}

export function KpiTile({ label, value, detail, testId }: KpiTileProps) {
  const styles = useStyles();
  return (
    <div className={styles.tile} data-testid={testId}>
      <Text weight="semibold">{label}</Text>
      <span className={styles.value} data-testid={testId ? `${testId}-value` : undefined}>
        {value}
      </span>
      {detail && <Text size={200}>{detail}</Text>}
    </div>
  );
}
