import {
  Button,
  createTableColumn,
  DataGrid,
  DataGridBody,
  DataGridCell,
  DataGridHeader,
  DataGridHeaderCell,
  DataGridRow,
  makeStyles,
  mergeClasses,
  Text,
  tokens,
  type SortDirection,
  type TableColumnDefinition,
  type TableColumnId,
} from '@fluentui/react-components';
import { useEffect, useState } from 'react';
import { ClassBadge, SeverityBadge } from '@/components/finding-badges';
import { HorizontalScroll } from '@/components/horizontal-scroll';
import type { Schema } from '@/lib/api-schemas';
import type { DiscrepancyFilters } from '../api/get-discrepancies';
import { StatusBadge } from './status-badge';

type Row = Schema<'DiscrepancyDto'>;

const useStyles = makeStyles({
  grid: { minWidth: '560px' },
  stack: {
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'flex-start',
    gap: '4px',
    paddingBlock: '6px',
  },
  code: { fontFamily: tokens.fontFamilyMonospace, fontWeight: tokens.fontWeightSemibold },
  message: { whiteSpace: 'normal', overflowWrap: 'anywhere', paddingTop: '6px', paddingBottom: '6px' },
  active: { backgroundColor: tokens.colorBrandBackground2 },
  narrow: { flexGrow: 0, flexShrink: 0, flexBasis: '88px' },
  badge: { flexGrow: 0, flexShrink: 0, flexBasis: '100px' },
  medium: { flexGrow: 0, flexShrink: 0, flexBasis: '124px' },
  wide: { flexGrow: 1, flexShrink: 1, flexBasis: '0px', minWidth: '160px' },
  sub: { display: 'block', color: tokens.colorNeutralForeground3, fontSize: tokens.fontSizeBase100 },
});

const noCompare = () => 0;

/** Below this width severity and class share one column and the status sits under the code. */
const COMPACT_QUERY = '(max-width: 1040px)';

function useCompact(): boolean {
  const [compact, setCompact] = useState(() => window.matchMedia(COMPACT_QUERY).matches);
  useEffect(() => {
    const query = window.matchMedia(COMPACT_QUERY);
    const onChange = () => setCompact(query.matches);
    query.addEventListener('change', onChange);
    return () => query.removeEventListener('change', onChange);
  }, []);
  return compact;
}

export interface DiscrepancyGridProps {
  readonly items: readonly Row[];
  readonly sort: DiscrepancyFilters['sort'];
  readonly order: DiscrepancyFilters['order'];
  readonly onSort: (sort: DiscrepancyFilters['sort'], order: DiscrepancyFilters['order']) => void;
  readonly selectable: boolean;
  readonly selected: ReadonlySet<number>;
  readonly onSelect: (ids: Set<number>) => void;
  readonly activeId: number | null;
  readonly onOpen: (id: number) => void;
}

/**
 * The discrepancy grid. Sorting is the server's: the grid only shows the arrow and asks for a new
 * page; the rows arrive in order.
 */
export function DiscrepancyGrid({
  items,
  sort,
  order,
  onSort,
  selectable,
  selected,
  onSelect,
  activeId,
  onOpen,
}: DiscrepancyGridProps) {
  const styles = useStyles();
  const compact = useCompact();
  const codeButton = (d: Row) => (
    <Button
      appearance="transparent"
      size="small"
      className={styles.code}
      onClick={(event) => {
        event.stopPropagation();
        onOpen(d.id);
      }}
      aria-label={`Open ${d.code} ${d.memberId ?? ''} details`}
    >
      {d.code}
    </Button>
  );
  const wideColumns: TableColumnDefinition<Row>[] = [
    createTableColumn<Row>({
      columnId: 'code',
      compare: noCompare,
      renderHeaderCell: () => 'Code',
      renderCell: codeButton,
    }),
    createTableColumn<Row>({
      columnId: 'severity',
      compare: noCompare,
      renderHeaderCell: () => 'Severity',
      renderCell: (d) => <SeverityBadge severity={d.severity} />,
    }),
    createTableColumn<Row>({
      columnId: 'class',
      compare: noCompare,
      renderHeaderCell: () => 'Class',
      renderCell: (d) => <ClassBadge findingClass={d.class} />,
    }),
    createTableColumn<Row>({
      columnId: 'memberId',
      compare: noCompare,
      renderHeaderCell: () => 'Member',
      renderCell: (d) => (
        <span>
          {d.memberId ?? '—'}
          <span className={styles.sub}>{d.fileName}</span>
        </span>
      ),
    }),
    createTableColumn<Row>({
      columnId: 'status',
      compare: noCompare,
      renderHeaderCell: () => 'Status',
      renderCell: (d) => <StatusBadge status={d.status} />,
    }),
    createTableColumn<Row>({
      columnId: 'message',
      renderHeaderCell: () => 'Finding',
      renderCell: (d) => (
        <Text size={200} className={styles.message} title={d.message}>
          {d.message}
        </Text>
      ),
    }),
  ];
  const compactColumns: TableColumnDefinition<Row>[] = [
    createTableColumn<Row>({
      columnId: 'code',
      compare: noCompare,
      renderHeaderCell: () => 'Code · status',
      renderCell: (d) => (
        <span className={styles.stack}>
          {codeButton(d)}
          <StatusBadge status={d.status} />
        </span>
      ),
    }),
    createTableColumn<Row>({
      columnId: 'severity',
      compare: noCompare,
      renderHeaderCell: () => 'Severity · class',
      renderCell: (d) => (
        <span className={styles.stack}>
          <SeverityBadge severity={d.severity} />
          <ClassBadge findingClass={d.class} />
        </span>
      ),
    }),
    ...wideColumns.filter((c) => c.columnId === 'memberId' || c.columnId === 'message'),
  ];
  const columns = compact ? compactColumns : wideColumns;
  const sortable = new Set(['code', 'severity', 'class', 'memberId', 'fileName', 'status', 'updatedAt']);
  const sizeOf = (columnId: TableColumnId) =>
    columnId === 'message'
      ? styles.wide
      : columnId === 'class' || columnId === 'memberId' || compact
        ? styles.medium
        : columnId === 'code'
          ? styles.narrow
          : styles.badge;

  return (
    <HorizontalScroll label="Discrepancies, table">
      <DataGrid
        className={styles.grid}
        items={[...items]}
        key={compact ? 'compact' : 'wide'}
        columns={columns}
        getRowId={(d: Row) => d.id}
        sortable
        sortState={{
          sortColumn: sort as TableColumnId,
          sortDirection: (order === 'asc' ? 'ascending' : 'descending') as SortDirection,
        }}
        onSortChange={(_, state) => {
          if (!sortable.has(String(state.sortColumn))) return;
          onSort(
            state.sortColumn as DiscrepancyFilters['sort'],
            state.sortDirection === 'ascending' ? 'asc' : 'desc',
          );
        }}
        selectionMode={selectable ? 'multiselect' : undefined}
        selectedItems={selected}
        onSelectionChange={(_, data) => onSelect(new Set([...data.selectedItems].map(Number)))}
        resizableColumns={false}
        aria-label="Discrepancies"
        focusMode="composite"
      >
        <DataGridHeader>
          <DataGridRow
            selectionCell={
              selectable
                ? { checkboxIndicator: { 'aria-label': 'Select every row on this page' } }
                : undefined
            }
          >
            {({ renderHeaderCell, columnId }) => (
              <DataGridHeaderCell className={sizeOf(columnId)}>{renderHeaderCell()}</DataGridHeaderCell>
            )}
          </DataGridRow>
        </DataGridHeader>
        <DataGridBody<Row>>
          {({ item, rowId }) => (
            <DataGridRow<Row>
              key={rowId}
              className={mergeClasses(activeId === item.id && styles.active)}
              selectionCell={
                selectable
                  ? { checkboxIndicator: { 'aria-label': `Select ${item.code} ${item.memberId ?? ''}` } }
                  : undefined
              }
              data-testid="discrepancy-row"
            >
              {({ renderCell, columnId }) => (
                <DataGridCell className={sizeOf(columnId)}>{renderCell(item)}</DataGridCell>
              )}
            </DataGridRow>
          )}
        </DataGridBody>
      </DataGrid>
    </HorizontalScroll>
  );
}
