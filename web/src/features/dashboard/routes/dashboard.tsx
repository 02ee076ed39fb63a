import {
  Button,
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
import { ArrowDownloadRegular } from '@fluentui/react-icons';
import { Link } from 'react-router-dom';
import { ClassCounts } from '@/components/class-counts';
import { PageHeader } from '@/components/page-header';
import { Section } from '@/components/section';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { sessionStore } from '@/lib/session';
import { useDownloadOpenCsv } from '../api/download-open-csv';
import { getDashboardQueryOptions, useDashboard } from '../api/get-dashboard';
import { KpiTile } from '../components/kpi-tile';
import { TrendChart } from '../components/trend-chart';

const useStyles = makeStyles({
  tiles: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(180px, 1fr))',
    gap: tokens.spacingHorizontalL,
    marginBottom: tokens.spacingVerticalL,
  },
  columns: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 3fr) minmax(0, 2fr)',
    gap: tokens.spacingHorizontalL,
    '@media (max-width: 1100px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
  num: { textAlign: 'right', fontVariantNumeric: 'tabular-nums' },
  // A header cell lays its text out in a flex box of its own: right-align that too, so each number
  // sits under its header.
  numHeader: { justifyContent: 'flex-end', textAlign: 'right', width: '100%' },
  ages: {
    display: 'grid',
    gridTemplateColumns: 'repeat(4, minmax(0, 1fr))',
    gap: tokens.spacingHorizontalS,
    textAlign: 'center',
  },
  age: {
    backgroundColor: tokens.colorNeutralBackground3,
    borderRadius: tokens.borderRadiusMedium,
    padding: tokens.spacingVerticalS,
  },
  ageValue: { display: 'block', fontSize: tokens.fontSizeBase600, fontWeight: tokens.fontWeightSemibold },
});

export function loader() {
  if (sessionStore.get()) void queryClient.prefetchQuery(getDashboardQueryOptions());
  return null;
}

export function Component() {
  const styles = useStyles();
  const dashboard = useDashboard();
  const csv = useDownloadOpenCsv();

  if (dashboard.isPending) return <LoadingState label="Loading the dashboard…" />;
  if (dashboard.isError)
    return <ErrorState error={dashboard.error} onRetry={() => void dashboard.refetch()} />;
  const d = dashboard.data;
  const ages = [
    { label: 'up to a week', value: d.openByAge.week },
    { label: '8–30 days', value: d.openByAge.month },
    { label: '31–90 days', value: d.openByAge.quarter },
    { label: 'over 90 days', value: d.openByAge.older },
  ];

  return (
    <>
      <PageHeader
        eyebrow="Across your projects"
        title="Open discrepancies"
        description={`As of ${formatDateTime(d.generatedAt)}.`}
        actions={
          <Button icon={<ArrowDownloadRegular />} onClick={() => csv.mutate()} disabled={csv.isPending}>
            {csv.isPending ? 'Exporting…' : 'Export open as CSV'}
          </Button>
        }
      />
      <div className={styles.tiles}>
        <KpiTile
          label="Open"
          value={d.openTotal}
          detail={
            d.superseded > 0
              ? `raised, answered or returned; ${d.superseded} taken over by later revisions not counted`
              : 'raised, answered or returned'
          }
          testId="kpi-open"
        />
        <KpiTile
          label="Serious (errors)"
          value={d.openBySeverity.error}
          detail="unsafe claims and missed chains"
          testId="kpi-errors"
        />
        <KpiTile
          label="Warnings"
          value={d.openBySeverity.warning}
          detail={`${d.openBySeverity.note} notes besides`}
        />
        <KpiTile
          label="Older than 30 days"
          value={d.openByAge.quarter + d.openByAge.older}
          detail="waiting for an answer or a decision"
        />
      </div>
      <div className={styles.columns}>
        <div>
          <Section title="Trend by submittal" labelId="trend-heading">
            {d.trend.length === 0 ? <EmptyState title="No submittals yet" /> : <TrendChart trend={d.trend} />}
          </Section>
          <Section title="Projects" labelId="projects-heading">
            {d.projects.length === 0 ? (
              <EmptyState title="You are not on any project yet" />
            ) : (
              <Table aria-label="Open discrepancies by project">
                <TableHeader>
                  <TableRow>
                    <TableHeaderCell>Project</TableHeaderCell>
                    <TableHeaderCell className={styles.num} button={{ className: styles.numHeader }}>
                      Submittals
                    </TableHeaderCell>
                    <TableHeaderCell className={styles.num} button={{ className: styles.numHeader }}>
                      Open
                    </TableHeaderCell>
                    <TableHeaderCell className={styles.num} button={{ className: styles.numHeader }}>
                      Errors
                    </TableHeaderCell>
                  </TableRow>
                </TableHeader>
                <TableBody>
                  {d.projects.map((p) => (
                    <TableRow key={p.id}>
                      <TableCell>
                        <Link to={paths.project.getHref(p.id)}>{p.name}</Link>
                      </TableCell>
                      <TableCell className={styles.num}>{p.submittals}</TableCell>
                      <TableCell className={styles.num}>
                        <Link to={paths.discrepancies.getHref({ projectId: p.id, status: 'open' })}>
                          {p.open}
                        </Link>
                      </TableCell>
                      <TableCell className={styles.num}>{p.openErrors}</TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
            )}
          </Section>
        </div>
        <div>
          <Section title="How serious: open by class" labelId="class-heading">
            <ClassCounts counts={d.openByClass} />
          </Section>
          <Section title="How old" labelId="age-heading">
            <div className={styles.ages}>
              {ages.map((a) => (
                <div key={a.label} className={styles.age}>
                  <span className={styles.ageValue}>{a.value}</span>
                  <Text size={200}>{a.label}</Text>
                </div>
              ))}
            </div>
          </Section>
        </div>
      </div>
    </>
  );
}
