import { makeStyles, tokens } from '@fluentui/react-components';

const useStyles = makeStyles({
  mark: { flexShrink: 0, display: 'block' },
  plate: { fill: tokens.colorBrandBackground },
  hole: { fill: tokens.colorNeutralBackground1 },
  line: {
    stroke: tokens.colorPaletteMarigoldBorderActive,
    strokeWidth: '2.2',
    fill: 'none',
    strokeLinejoin: 'round',
  },
});

export interface LogoMarkProps {
  readonly size?: number;
  /** Accessible name; omit when a visible wordmark sits beside the mark. */
  readonly title?: string;
}

/**
 * Ligament's mark: a plate with four staggered holes and the zigzag fracture line through them —
 * the thing the product checks.
 */
export function LogoMark({ size = 28, title }: LogoMarkProps) {
  const styles = useStyles();
  return (
    <svg
      className={styles.mark}
      width={size}
      height={size}
      viewBox="0 0 32 32"
      role={title ? 'img' : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
    >
      <rect className={styles.plate} x="2" y="2" width="28" height="28" rx="6" />
      <circle className={styles.hole} cx="11" cy="8" r="2.6" />
      <circle className={styles.hole} cx="20" cy="13" r="2.6" />
      <circle className={styles.hole} cx="11" cy="19" r="2.6" />
      <circle className={styles.hole} cx="20" cy="24" r="2.6" />
      <polyline className={styles.line} points="11,2 11,8 20,13 11,19 20,24 20,30" />
    </svg>
  );
}
