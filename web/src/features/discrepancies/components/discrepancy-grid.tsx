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
import { useEffect, useState, type KeyboardEvent } from 'react';
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
  superseded: { color: tokens.colorNeutralForeground3 },
  submittal: { fontVariantNumeric: 'tabular-nums' },
});

const noCompare = () => 0;

/** A tabster attribute (the JSON its hooks write) that makes it ignore Enter inside the grid. */
const IGNORE_ENTER = JSON.stringify({ focusable: { ignoreKeydown: { Enter: true } } });

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
  /** Titles of the project's submittals, for the submittal column. */
  readonly submittalTitles?: ReadonlyMap<number, string>;
}

/** Who has it and by when, and whether a later revision took it over: the line under the status. */
function StatusNote({ d, className }: { d: Row; className: string }) {
  const parts = [
    d.current
      ? null
      : d.status === 'resolved'
        ? `by #${d.supersededBySubmittalId}`
        : `carried into #${d.supersededBySubmittalId}`,
    d.assignee ? `→ ${d.assignee.name}` : null,
    d.dueDate ? `due ${d.dueDate}` : null,
  ].filter(Boolean);
  return parts.length > 0 ? <span className={className}>{parts.join(' · ')}</span> : null;
}

/**
 * The discrepancy grid. Sorting is the server's: the grid only shows the arrow and asks for a new
 * page; the rows arrive in order. Arrow keys move between rows and cells; Enter opens the focused
 * row (Space selects it, as everywhere in a Fluent grid).
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
  submittalTitles,
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
          {compact && (
            <span className={styles.sub} title={submittalTitles?.get(d.submittalId)}>
              submittal #{d.submittalId}
            </span>
          )}
        </span>
      ),
    }),
    createTableColumn<Row>({
      columnId: 'submittalId',
      compare: noCompare,
      renderHeaderCell: () => 'Submittal',
      renderCell: (d) => (
        <span className={styles.submittal} title={submittalTitles?.get(d.submittalId)}>
          #{d.submittalId}
        </span>
      ),
    }),
    createTableColumn<Row>({
      columnId: 'status',
      compare: noCompare,
      renderHeaderCell: () => 'Status',
      renderCell: (d) => (
        <span className={styles.stack}>
          <StatusBadge status={d.status} />
          <StatusNote d={d} className={styles.sub} />
        </span>
      ),
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
          <StatusNote d={d} className={styles.sub} />
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
  const sortable = new Set([
    'code',
    'severity',
    'class',
    'memberId',
    'fileName',
    'status',
    'updatedAt',
    'submittalId',
  ]);
  const sizeOf = (columnId: TableColumnId) =>
    columnId === 'message'
      ? styles.wide
      : columnId === 'class' || columnId === 'memberId' || compact
        ? styles.medium
        : columnId === 'code' || columnId === 'submittalId'
          ? styles.narrow
          : styles.badge;

  return (
    // Tabster (Fluent's keyboard layer) would take Enter on a focused row to step into its cells;
    // told to leave Enter alone here, the row's own handler opens the discrepancy. Arrow right or
    // Tab still step into the cells.
    <div data-tabster={IGNORE_ENTER}>
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
                className={mergeClasses(
                  activeId === item.id && styles.active,
                  !item.current && styles.superseded,
                )}
                selectionCell={
                  selectable
                    ? { checkboxIndicator: { 'aria-label': `Select ${item.code} ${item.memberId ?? ''}` } }
                    : undefined
                }
                data-testid="discrepancy-row"
                onKeyDown={(event: KeyboardEvent<HTMLElement>) => {
                  // Enter on the focused row, one of its cells or its selection box opens it (Space
                  // selects); a button, link or text field inside keeps its own Enter.
                  if (event.key !== 'Enter') return;
                  if (
                    (event.target as HTMLElement).closest(
                      'button, a, textarea, select, input:not([type="checkbox"])',
                    )
                  )
                    return;
                  event.preventDefault();
                  onOpen(item.id);
                }}
              >
                {({ renderCell, columnId }) => (
                  <DataGridCell className={sizeOf(columnId)}>{renderCell(item)}</DataGridCell>
                )}
              </DataGridRow>
            )}
          </DataGridBody>
        </DataGrid>
      </HorizontalScroll>
    </div>
  );
}
