import { Badge, makeStyles, tokens } from '@fluentui/react-components';
import { ErrorCircleFilled, InfoFilled, WarningFilled } from '@fluentui/react-icons';
import type { FindingClass, Severity } from 'ligament/engine';
import type { ReactElement } from 'react';
import {
  findingClassColours,
  findingClassLabels,
  isFindingClass,
  severityLabels,
} from '@/lib/finding-classes';

const useStyles = makeStyles({
  classBadge: {
    display: 'inline-flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalXS,
    whiteSpace: 'nowrap',
  },
  swatch: { width: '10px', height: '10px', borderRadius: tokens.borderRadiusSmall, flexShrink: 0 },
});

export interface ClassBadgeProps {
  readonly findingClass: FindingClass | string;
}

/** The class name with its chart colour as a small swatch beside it. */
export function ClassBadge({ findingClass }: ClassBadgeProps) {
  const styles = useStyles();
  const known = isFindingClass(findingClass);
  return (
    <span className={styles.classBadge}>
      <span
        className={styles.swatch}
        style={{
          backgroundColor: known ? findingClassColours[findingClass] : tokens.colorNeutralForeground3,
        }}
        aria-hidden
      />
      {known ? findingClassLabels[findingClass] : findingClass}
    </span>
  );
}

const severityAppearance: Record<
  Severity,
  { color: 'danger' | 'warning' | 'informative'; icon: ReactElement }
> = {
  error: { color: 'danger', icon: <ErrorCircleFilled /> },
  warning: { color: 'warning', icon: <WarningFilled /> },
  note: { color: 'informative', icon: <InfoFilled /> },
};

export interface SeverityBadgeProps {
  readonly severity: Severity | string;
}

/** Severity as an icon and a word, not a colour alone. */
export function SeverityBadge({ severity }: SeverityBadgeProps) {
  const appearance = severityAppearance[severity as Severity] ?? severityAppearance.note;
  return (
    <Badge appearance="tint" color={appearance.color} icon={appearance.icon} shape="rounded">
      {severityLabels[severity as Severity] ?? severity}
    </Badge>
  );
}
