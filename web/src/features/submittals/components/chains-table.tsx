import {
  Badge,
  makeStyles,
  mergeClasses,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  tokens,
} from '@fluentui/react-components';
import { formatQuantity, unitSymbol, type Dimension, type UnitSystem } from 'ligament/engine';
import { chainKey, chainLabel } from '@/lib/units';

const useStyles = makeStyles({
  row: {
    cursor: 'default',
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '-2px' },
  },
  highlighted: { backgroundColor: tokens.colorBrandBackground2 },
  num: { textAlign: 'right', fontVariantNumeric: 'tabular-nums' },
  holes: { fontFamily: tokens.fontFamilyMonospace },
});

export interface ChainRow {
  readonly holes: readonly string[];
  readonly deducted?: number;
  readonly staggerSum?: number;
  readonly netWidth: number;
  readonly netArea: number;
}

export interface ChainsTableProps {
  readonly direction: string;
  readonly chains: readonly ChainRow[];
  readonly governing: readonly string[] | null;
  readonly units: UnitSystem;
  readonly highlighted: string | null;
  readonly onHighlight: (key: string | null) => void;
}

/** The k least admissible chains for one load direction; hovering or focusing a row lights its line in the drawing. */
export function ChainsTable({
  direction,
  chains,
  governing,
  units,
  highlighted,
  onHighlight,
}: ChainsTableProps) {
  const styles = useStyles();
  const unit = (dimension: Dimension) => unitSymbol(dimension, units);
  const n = (value: number | undefined, dimension: Dimension) =>
    value === undefined ? '—' : formatQuantity(value, dimension, units, { unit: false });
  const governingKey = governing ? chainKey(direction, governing) : null;
  return (
    <Table size="small" aria-label={`Least chains, load from ${direction}`}>
      <TableHeader>
        <TableRow>
          <TableHeaderCell>#</TableHeaderCell>
          <TableHeaderCell>Chain (holes in y order)</TableHeaderCell>
          <TableHeaderCell className={styles.num}>Holes deducted ({unit('length')})</TableHeaderCell>
          <TableHeaderCell className={styles.num}>Σ s²/4g ({unit('length')})</TableHeaderCell>
          <TableHeaderCell className={styles.num}>Net width ({unit('length')})</TableHeaderCell>
          <TableHeaderCell className={styles.num}>Net area ({unit('area')})</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {chains.map((chain, index) => {
          const key = chainKey(direction, chain.holes);
          return (
            <TableRow
              key={key}
              tabIndex={0}
              data-chain={key}
              className={mergeClasses(styles.row, highlighted === key && styles.highlighted)}
              onMouseEnter={() => onHighlight(key)}
              onMouseLeave={() => onHighlight(null)}
              onFocus={() => onHighlight(key)}
              onBlur={() => onHighlight(null)}
              aria-label={`Chain ${chainLabel(chain.holes)}, net width ${formatQuantity(chain.netWidth, 'length', units)}${key === governingKey ? ', governing' : ''}`}
            >
              <TableCell>{index + 1}</TableCell>
              <TableCell>
                <span className={styles.holes}>{chainLabel(chain.holes)}</span>{' '}
                {key === governingKey && (
                  <Badge appearance="filled" color="brand" size="small">
                    governing
                  </Badge>
                )}
              </TableCell>
              <TableCell className={styles.num}>{n(chain.deducted, 'length')}</TableCell>
              <TableCell className={styles.num}>{n(chain.staggerSum, 'length')}</TableCell>
              <TableCell className={styles.num}>{n(chain.netWidth, 'length')}</TableCell>
              <TableCell className={styles.num}>{n(chain.netArea, 'area')}</TableCell>
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}
