import {
  makeStyles,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  tokens,
} from '@fluentui/react-components';
import { ArrowDownRegular, ArrowUpRegular, CheckmarkRegular, SubtractRegular } from '@fluentui/react-icons';
import type { MemberClaims } from 'ligament/calc';
import { quantityText, withinTolerance, type Dimension, type UnitSystem } from 'ligament/engine';
import { HorizontalScroll } from '@/components/horizontal-scroll';
import { chainLabel } from '@/lib/units';

const useStyles = makeStyles({
  table: { tableLayout: 'auto' },
  num: { textAlign: 'right', fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' },
  over: { color: tokens.colorPaletteRedForeground1, fontWeight: tokens.fontWeightSemibold },
  under: { color: tokens.colorPaletteDarkOrangeForeground1 },
  same: { color: tokens.colorPaletteGreenForeground1 },
  none: { color: tokens.colorNeutralForeground3 },
  mark: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalXXS },
  diffRow: { backgroundColor: tokens.colorPaletteRedBackground1 },
});

/** What the engine recomputed for a member, in the calc file's units. */
export interface Recomputed {
  readonly Ag: number;
  readonly An: number;
  readonly U: number;
  readonly Ae: number;
  readonly yielding: number;
  readonly rupture: number;
  readonly available: number;
  /** Available block shear strength, when the calc gives block-shear input. */
  readonly blockShear?: number;
  /** Limit state of the governing strength: yielding, rupture or block shear. */
  readonly governs?: string;
  readonly controllingChain: readonly string[] | null;
}

type NumericKey = 'Ag' | 'An' | 'U' | 'Ae' | 'yielding' | 'rupture' | 'blockShear' | 'available';

const rows: readonly { key: NumericKey; label: string; kind: Dimension }[] = [
  { key: 'Ag', label: 'Gross area Ag', kind: 'area' },
  { key: 'An', label: 'Net area An', kind: 'area' },
  { key: 'U', label: 'Shear lag factor U', kind: 'ratio' },
  { key: 'Ae', label: 'Effective area Ae', kind: 'area' },
  { key: 'yielding', label: 'Tensile yielding (available)', kind: 'force' },
  { key: 'rupture', label: 'Tensile rupture (available)', kind: 'force' },
  { key: 'blockShear', label: 'Block shear (available)', kind: 'force' },
  { key: 'available', label: 'Governing available strength', kind: 'force' },
];

export interface ClaimsComparisonProps {
  readonly claims: MemberClaims | undefined;
  readonly recomputed: Recomputed;
  readonly units: UnitSystem;
  /** Relative tolerance the server compared with (0.005 = 0.5 %). */
  readonly tolerance?: number;
}

type Verdict = 'over' | 'under' | 'same' | 'none';

/** The engine's own comparison (withinTolerance), with the relative tolerance the server used. */
function verdict(
  claimed: number | undefined,
  recomputed: number,
  kind: Dimension,
  tolerance: number,
): Verdict {
  if (claimed === undefined) return 'none';
  if (withinTolerance(claimed, recomputed, kind, { relative: tolerance })) return 'same';
  return claimed > recomputed ? 'over' : 'under';
}

/** Claimed and recomputed values side by side; each difference is marked with an arrow and a word as well as colour. */
export function ClaimsComparison({ claims, recomputed, units, tolerance = 0.005 }: ClaimsComparisonProps) {
  const styles = useStyles();
  const claimedChain = claims?.controllingChain?.holes;
  const chainSame =
    claimedChain && recomputed.controllingChain
      ? claimedChain.join(',') === recomputed.controllingChain.join(',')
      : undefined;

  const mark = (v: Verdict, claimed: number | undefined, value: number) => {
    if (v === 'none')
      return (
        <span className={`${styles.mark} ${styles.none}`}>
          <SubtractRegular aria-hidden /> not claimed
        </span>
      );
    if (v === 'same')
      return (
        <span className={`${styles.mark} ${styles.same}`}>
          <CheckmarkRegular aria-hidden /> agrees
        </span>
      );
    const pct = (((claimed ?? 0) - value) / Math.max(Math.abs(value), Number.EPSILON)) * 100;
    return v === 'over' ? (
      <span className={`${styles.mark} ${styles.over}`}>
        <ArrowUpRegular aria-hidden /> overstated by {Math.abs(pct).toFixed(1)} %
      </span>
    ) : (
      <span className={`${styles.mark} ${styles.under}`}>
        <ArrowDownRegular aria-hidden /> understated by {Math.abs(pct).toFixed(1)} %
      </span>
    );
  };

  return (
    <div>
      <HorizontalScroll label="Claimed against recomputed, table" minWidth="520px">
        <Table size="small" aria-label="Claimed against recomputed" className={styles.table}>
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Quantity</TableHeaderCell>
              <TableHeaderCell className={styles.num}>Claimed</TableHeaderCell>
              <TableHeaderCell className={styles.num}>Recomputed</TableHeaderCell>
              <TableHeaderCell>Difference</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {rows.map(({ key, label, kind }) => {
              const claimed = claims?.[key];
              const value = recomputed[key];
              if (value === undefined) return null;
              const v = verdict(claimed, value, kind, tolerance);
              return (
                <TableRow key={key} className={v === 'over' ? styles.diffRow : undefined}>
                  <TableCell>
                    {label}
                    {key === 'available' && recomputed.governs ? `, ${recomputed.governs}` : ''}
                  </TableCell>
                  <TableCell className={styles.num}>{quantityText(claimed, kind, units)}</TableCell>
                  <TableCell className={styles.num}>{quantityText(value, kind, units)}</TableCell>
                  <TableCell>{mark(v, claimed, value)}</TableCell>
                </TableRow>
              );
            })}
            <TableRow className={chainSame === false ? styles.diffRow : undefined}>
              <TableCell>Controlling chain</TableCell>
              <TableCell className={styles.num}>{claimedChain ? chainLabel(claimedChain) : '—'}</TableCell>
              <TableCell className={styles.num}>
                {recomputed.controllingChain ? chainLabel(recomputed.controllingChain) : 'none can form'}
              </TableCell>
              <TableCell>
                {chainSame === undefined ? (
                  <span className={`${styles.mark} ${styles.none}`}>
                    <SubtractRegular aria-hidden /> not claimed
                  </span>
                ) : chainSame ? (
                  <span className={`${styles.mark} ${styles.same}`}>
                    <CheckmarkRegular aria-hidden /> agrees
                  </span>
                ) : (
                  <span className={`${styles.mark} ${styles.over}`}>
                    <ArrowUpRegular aria-hidden /> differs
                  </span>
                )}
              </TableCell>
            </TableRow>
          </TableBody>
        </Table>
      </HorizontalScroll>
      <Text size={200}>
        Values within {(tolerance * 100).toFixed(1)} % of the recomputation are taken to agree.
      </Text>
    </div>
  );
}
