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
import type { UnitSystem } from 'ligament/engine';
import { chainKey, chainLabel, formatQuantity, unitLabels } from '@/lib/units';

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
  const u = unitLabels[units];
  const governingKey = governing ? chainKey(direction, governing) : null;
  return (
    <Table size="small" aria-label={`Least chains, load from ${direction}`}>
      <TableHeader>
        <TableRow>
          <TableHeaderCell>#</TableHeaderCell>
          <TableHeaderCell>Chain (holes in y order)</TableHeaderCell>
          <TableHeaderCell className={styles.num}>Holes deducted ({u.length})</TableHeaderCell>
          <TableHeaderCell className={styles.num}>Σ s²/4g ({u.length})</TableHeaderCell>
          <TableHeaderCell className={styles.num}>Net width ({u.length})</TableHeaderCell>
          <TableHeaderCell className={styles.num}>Net area ({u.area})</TableHeaderCell>
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
              aria-label={`Chain ${chainLabel(chain.holes)}, net width ${formatQuantity(chain.netWidth, units, 'length')} ${u.length}${key === governingKey ? ', governing' : ''}`}
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
              <TableCell className={styles.num}>{formatQuantity(chain.deducted, units, 'length')}</TableCell>
              <TableCell className={styles.num}>
                {formatQuantity(chain.staggerSum, units, 'length')}
              </TableCell>
              <TableCell className={styles.num}>{formatQuantity(chain.netWidth, units, 'length')}</TableCell>
              <TableCell className={styles.num}>{formatQuantity(chain.netArea, units, 'area')}</TableCell>
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}
