import { makeStyles, Subtitle2, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';

const useStyles = makeStyles({
  section: {
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow2,
    padding: tokens.spacingHorizontalL,
    marginBottom: tokens.spacingVerticalL,
    minWidth: 0,
    '@media print': { boxShadow: 'none', padding: 0 },
  },
  head: {
    display: 'flex',
    justifyContent: 'space-between',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalM,
    flexWrap: 'wrap',
  },
});

export interface SectionProps {
  readonly title?: ReactNode;
  readonly actions?: ReactNode;
  readonly children: ReactNode;
  readonly labelId?: string;
}

/** A white panel on the grey page, with an optional heading. */
export function Section({ title, actions, children, labelId }: SectionProps) {
  const styles = useStyles();
  return (
    <section className={styles.section} aria-labelledby={labelId}>
      {(title || actions) && (
        <div className={styles.head}>
          {title && (
            <Subtitle2 as="h2" id={labelId}>
              {title}
            </Subtitle2>
          )}
          {actions}
        </div>
      )}
      {children}
    </section>
  );
}
