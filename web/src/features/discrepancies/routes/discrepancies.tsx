import {
  Button,
  DrawerBody,
  DrawerHeader,
  DrawerHeaderTitle,
  Dropdown,
  Field,
  makeStyles,
  mergeClasses,
  Option,
  OverlayDrawer,
  Text,
  tokens,
} from '@fluentui/react-components';
import {
  ArrowDownloadRegular,
  ChevronLeftRegular,
  ChevronRightRegular,
  DismissRegular,
  DocumentBulletListRegular,
} from '@fluentui/react-icons';
import { useEffect, useState } from 'react';
import { useLocation, useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { Section } from '@/components/section';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { useSession } from '@/lib/session';
import { useDownloadDiscrepanciesCsv } from '../api/download-discrepancies-csv';
import { useDiscrepancies, type DiscrepancyFilters } from '../api/get-discrepancies';
import { useDiscrepancyProjects } from '../api/get-discrepancy-projects';
import { useProjectSubmittals } from '../api/get-revision-candidates';
import { BulkMoveBar } from '../components/bulk-move-bar';
import { DiscrepancyDetail } from '../components/discrepancy-detail';
import { DiscrepancyFilters as FiltersBar, type FilterValues } from '../components/discrepancy-filters';
import { DiscrepancyGrid } from '../components/discrepancy-grid';

const useStyles = makeStyles({
  layout: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr)',
    gap: tokens.spacingHorizontalL,
    alignItems: 'start',
  },
  // The detail grows with the screen (30 % of the workspace, 380–560 px) so a wide screen gives the
  // comments and history room instead of leaving it empty at the sides.
  layoutWithDetail: { gridTemplateColumns: 'minmax(0, 1fr) clamp(380px, 30%, 560px)' },
  detail: {
    position: 'sticky',
    top: tokens.spacingVerticalL,
    maxHeight: `calc(100vh - 2 * ${tokens.spacingVerticalL})`,
    overflowY: 'auto',
    borderRadius: tokens.borderRadiusLarge,
  },
  drawerBody: { paddingTop: tokens.spacingVerticalL, paddingBottom: tokens.spacingVerticalL },
  pager: {
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalM,
    flexWrap: 'wrap',
    marginTop: tokens.spacingVerticalM,
  },
  pagerButtons: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalS },
  picker: { maxWidth: '420px', marginBottom: tokens.spacingVerticalL },
  listTools: {
    display: 'flex',
    justifyContent: 'space-between',
    alignItems: 'center',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalS,
    marginBottom: tokens.spacingVerticalS,
  },
});

const SORTS: readonly DiscrepancyFilters['sort'][] = [
  'id',
  'createdAt',
  'updatedAt',
  'severity',
  'class',
  'status',
  'memberId',
  'code',
  'fileName',
  'submittalId',
  'dueDate',
];
/** Wide enough for the grid and the detail side by side; narrower, the detail opens as a drawer over the grid. */
const WIDE_QUERY = '(min-width: 1400px)';

function useWideLayout(): boolean {
  const [wide, setWide] = useState(() => window.matchMedia(WIDE_QUERY).matches);
  useEffect(() => {
    const query = window.matchMedia(WIDE_QUERY);
    const onChange = () => setWide(query.matches);
    query.addEventListener('change', onChange);
    return () => query.removeEventListener('change', onChange);
  }, []);
  return wide;
}

const list = (v: string | null) => (v ? v.split(',').filter(Boolean) : []);

export function Component() {
  const styles = useStyles();
  const role = useSession()?.user.role;
  const [params, setParams] = useSearchParams();
  const location = useLocation();
  const projects = useDiscrepancyProjects();
  const [selected, setSelected] = useState<Set<number>>(new Set());
  const [activeId, setActiveId] = useState<number | null>(null);
  const wide = useWideLayout();

  const projectId = params.get('projectId') ? Number(params.get('projectId')) : projects.data?.[0]?.id;
  const sortParam = params.get('sort') as DiscrepancyFilters['sort'] | null;
  const filters: DiscrepancyFilters = {
    submittalId: params.get('submittalId') ? Number(params.get('submittalId')) : undefined,
    status: params.has('status') ? list(params.get('status')) : ['open'],
    class: list(params.get('class')),
    severity: list(params.get('severity')),
    memberId: params.get('memberId') ?? '',
    code: params.get('code') ?? '',
    q: params.get('q') ?? '',
    includeSuperseded: params.get('includeSuperseded') === 'true',
    sort: sortParam && SORTS.includes(sortParam) ? sortParam : 'severity',
    order: params.get('order') === 'desc' ? 'desc' : 'asc',
    page: Math.max(1, Number(params.get('page') ?? 1) || 1),
    pageSize: [25, 50, 100].includes(Number(params.get('pageSize'))) ? Number(params.get('pageSize')) : 25,
  };
  const discrepancies = useDiscrepancies(projectId, filters);
  const submittals = useProjectSubmittals(projectId);
  const csv = useDownloadDiscrepanciesCsv(projectId, filters);

  const update = (
    next: Record<string, string | readonly string[] | number | boolean | undefined>,
    resetPage = true,
  ) => {
    const p = new URLSearchParams(params);
    if (projectId !== undefined) p.set('projectId', String(projectId));
    for (const [key, value] of Object.entries(next)) {
      const text = Array.isArray(value)
        ? value.join(',')
        : value === undefined || value === false
          ? ''
          : String(value);
      if (text === '' && key !== 'status') p.delete(key);
      else p.set(key, text);
    }
    if (resetPage) p.delete('page');
    setParams(p, { replace: true });
    setSelected(new Set());
  };

  const filterValues: FilterValues = {
    q: filters.q ?? '',
    submittalId: filters.submittalId,
    includeSuperseded: filters.includeSuperseded ?? false,
    status: filters.status ?? [],
    class: filters.class ?? [],
    severity: filters.severity ?? [],
    memberId: filters.memberId ?? '',
    code: filters.code ?? '',
  };
  const total = discrepancies.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / filters.pageSize));
  const project = projects.data?.find((p) => p.id === projectId);
  const submittalTitles = new Map((submittals.data ?? []).map((s) => [s.id, s.title]));
  const items = discrepancies.data?.items ?? [];
  const selectedRows = items.filter((d) => selected.has(d.id));

  const open = activeId !== null && projectId !== undefined;
  const detailPanel = open ? (
    <DiscrepancyDetail
      key={activeId}
      discrepancyId={activeId}
      projectId={projectId}
      onClose={wide ? () => setActiveId(null) : undefined}
      onOpenOther={setActiveId}
    />
  ) : null;

  if (projects.isPending) return <LoadingState label="Loading your projects…" />;
  if (projects.isError) return <ErrorState error={projects.error} onRetry={() => void projects.refetch()} />;
  if (projects.data.length === 0)
    return (
      <EmptyState title="No projects yet">Discrepancies appear once a project has submittals.</EmptyState>
    );

  return (
    <>
      <PageHeader
        eyebrow={project?.name ?? 'Discrepancies'}
        title="Discrepancies"
        description={
          filters.submittalId
            ? `Raised by submittal #${filters.submittalId}. Clear the filter to see the whole project.`
            : 'Every difference between what was claimed and what Ligament recomputed, with its status.'
        }
      />
      <Field label="Project" className={styles.picker}>
        <Dropdown
          value={project?.name ?? ''}
          selectedOptions={projectId ? [String(projectId)] : []}
          onOptionSelect={(_, d) => {
            setActiveId(null);
            setSelected(new Set());
            setParams(new URLSearchParams({ projectId: d.optionValue ?? '' }), { replace: true });
          }}
        >
          {projects.data.map((p) => (
            <Option key={p.id} value={String(p.id)}>
              {p.name}
            </Option>
          ))}
        </Dropdown>
      </Field>
      <div className={mergeClasses(styles.layout, open && wide && styles.layoutWithDetail)}>
        <Section>
          {/* Says while a new page is on its way, so a reader (and a test) knows the rows may change. */}
          <div
            data-testid="discrepancy-list"
            aria-busy={discrepancies.isFetching}
            // The address whose rows are shown: empty while the rows of the previous one stay on screen.
            data-search={discrepancies.isSuccess && !discrepancies.isPlaceholderData ? location.search : ''}
          >
            <FiltersBar
              values={filterValues}
              submittals={submittals.data ?? []}
              onChange={(next) => update(next)}
              onClear={() => {
                setParams(
                  new URLSearchParams(projectId ? { projectId: String(projectId), status: '' } : {}),
                  {
                    replace: true,
                  },
                );
                setSelected(new Set());
              }}
            />
            <div className={styles.listTools}>
              {filters.submittalId ? (
                <Button size="small" onClick={() => update({ submittalId: undefined })}>
                  Showing submittal #{filters.submittalId} only — show all
                </Button>
              ) : (
                <Text size={200}>
                  {filters.includeSuperseded
                    ? 'Every item, with those a later revision carried on or resolved.'
                    : 'Current items only: a later revision’s carried and resolved items are counted where they are now.'}
                </Text>
              )}
              <Button
                icon={<ArrowDownloadRegular />}
                onClick={() => csv.mutate()}
                disabled={csv.isPending || total === 0 || projectId === undefined}
              >
                {csv.isPending ? 'Exporting…' : `Export ${total} as CSV`}
              </Button>
            </div>
            {role === 'checker' && selectedRows.length > 0 && projectId !== undefined && (
              <BulkMoveBar
                projectId={projectId}
                selected={selectedRows}
                onDone={() => setSelected(new Set())}
                onNarrow={setSelected}
              />
            )}
            {discrepancies.isPending ? (
              <LoadingState label="Loading discrepancies…" />
            ) : discrepancies.isError ? (
              <ErrorState error={discrepancies.error} onRetry={() => void discrepancies.refetch()} />
            ) : discrepancies.data.items.length === 0 ? (
              <EmptyState title="Nothing matches these filters" icon={<DocumentBulletListRegular />}>
                {filters.q
                  ? `Nothing matches “${filters.q}” with these filters.`
                  : filters.status?.includes('open')
                    ? 'No open discrepancies: every one has been accepted, waived or resolved, or none were raised.'
                    : 'Try other filters.'}
              </EmptyState>
            ) : (
              <>
                <DiscrepancyGrid
                  items={discrepancies.data.items}
                  sort={filters.sort}
                  order={filters.order}
                  onSort={(sort, order) => update({ sort, order })}
                  selectable={role === 'checker'}
                  selected={selected}
                  onSelect={setSelected}
                  activeId={activeId}
                  onOpen={setActiveId}
                  submittalTitles={submittalTitles}
                />
                <nav className={styles.pager} aria-label="Pages">
                  <Text>
                    {total} discrepanc{total === 1 ? 'y' : 'ies'} · page {filters.page} of {pages}
                    {discrepancies.isFetching ? ' · updating…' : ''}
                  </Text>
                  <div className={styles.pagerButtons}>
                    <Dropdown
                      aria-label="Rows per page"
                      value={`${filters.pageSize} per page`}
                      selectedOptions={[String(filters.pageSize)]}
                      onOptionSelect={(_, d) => update({ pageSize: d.optionValue })}
                      style={{ minWidth: '140px' }}
                    >
                      {[25, 50, 100].map((n) => (
                        <Option key={n} value={String(n)} text={`${n} per page`}>
                          {`${n} per page`}
                        </Option>
                      ))}
                    </Dropdown>
                    <Button
                      icon={<ChevronLeftRegular />}
                      disabled={filters.page <= 1}
                      onClick={() => update({ page: filters.page - 1 }, false)}
                    >
                      Previous
                    </Button>
                    <Button
                      icon={<ChevronRightRegular />}
                      iconPosition="after"
                      disabled={filters.page >= pages}
                      onClick={() => update({ page: filters.page + 1 }, false)}
                    >
                      Next
                    </Button>
                  </div>
                </nav>
              </>
            )}
          </div>
        </Section>
        {open && wide && (
          <aside className={styles.detail} aria-label="Discrepancy details" data-testid="discrepancy-aside">
            <Section>{detailPanel}</Section>
          </aside>
        )}
      </div>
      {open && !wide && (
        <OverlayDrawer
          open
          position="end"
          size="medium"
          onOpenChange={(_, d) => {
            if (!d.open) setActiveId(null);
          }}
          aria-label="Discrepancy details"
        >
          {/* The header's close button is there from the first frame, so the drawer opens with focus on
              it (not on the drawer itself while the detail loads) and its modal keeps it readable. */}
          <DrawerHeader>
            <DrawerHeaderTitle
              action={
                <Button
                  appearance="subtle"
                  aria-label="Close the details"
                  icon={<DismissRegular />}
                  onClick={() => setActiveId(null)}
                />
              }
            >
              Discrepancy #{activeId}
            </DrawerHeaderTitle>
          </DrawerHeader>
          <DrawerBody className={styles.drawerBody}>{detailPanel}</DrawerBody>
        </OverlayDrawer>
      )}
    </>
  );
}
