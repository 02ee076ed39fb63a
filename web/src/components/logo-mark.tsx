import { makeStyles, tokens } from '@fluentui/react-components';

const useStyles = makeStyles({
  mark: { flexShrink: 0, display: 'block' },
  plate: { fill: tokens.colorBrandBackground },
  hole: { fill: tokens.colorNeutralBackground1 },
  plateOnBrand: { fill: tokens.colorNeutralForegroundOnBrand },
  holeOnBrand: { fill: tokens.colorBrandBackgroundStatic },
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
  /** Drawn on the brand colour (header, sign-in panel): a light plate with brand-coloured holes. */
  readonly onBrand?: boolean;
}

/**
 * Ligament's mark: a plate with four staggered holes and the zigzag fracture line through them —
 * the thing the product checks.
 */
export function LogoMark({ size = 28, title, onBrand = false }: LogoMarkProps) {
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
      <rect
        className={onBrand ? styles.plateOnBrand : styles.plate}
        x="2"
        y="2"
        width="28"
        height="28"
        rx="6"
      />
      {[
        [11, 8],
        [20, 13],
        [11, 19],
        [20, 24],
      ].map(([cx, cy]) => (
        <circle
          key={`${cx}-${cy}`}
          className={onBrand ? styles.holeOnBrand : styles.hole}
          cx={cx}
          cy={cy}
          r="2.6"
        />
      ))}
      <polyline className={styles.line} points="11,2 11,8 20,13 11,19 20,24 20,30" />
    </svg>
  );
}
