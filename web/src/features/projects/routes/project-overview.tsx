import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { ArrowUploadRegular, DocumentBulletListRegular } from '@fluentui/react-icons';
import type { FindingClass } from 'ligament/engine';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ClassCounts } from '@/components/class-counts';
import { PageHeader } from '@/components/page-header';
import { Section } from '@/components/section';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { paths } from '@/config/paths';
import { FINDING_CLASSES, findingClassLabels, isFindingClass } from '@/lib/finding-classes';
import { queryClient } from '@/lib/query-client';
import { sessionStore, useSession } from '@/lib/session';
import { useProjectCounts } from '../api/get-dashboard-counts';
import { useOpenDiscrepancies } from '../api/get-open-discrepancies';
import { getProjectQueryOptions, useProject } from '../api/get-project';
import { getSubmittalsQueryOptions, useSubmittals } from '../api/get-submittals';
import { ActivityLog } from '../components/activity-log';
import { OpenFindingsChart, type RevisionCounts } from '../components/open-findings-chart';
import { SubmittalsTable } from '../components/submittals-table';

const useStyles = makeStyles({
  columns: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 3fr) minmax(0, 2fr)',
    gap: tokens.spacingHorizontalL,
    '@media (max-width: 1100px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
});

export function loader({ params }: LoaderFunctionArgs) {
  const projectId = Number(params.projectId);
  if (sessionStore.get() && Number.isInteger(projectId)) {
    void queryClient.prefetchQuery(getProjectQueryOptions(projectId));
    void queryClient.prefetchQuery(getSubmittalsQueryOptions(projectId));
  }
  return null;
}

export function Component() {
  const styles = useStyles();
  const projectId = Number(useParams().projectId);
  const navigate = useNavigate();
  const role = useSession()?.user.role;
  const project = useProject(projectId);
  const submittals = useSubmittals(projectId);
  const open = useOpenDiscrepancies(projectId);
  const counts = useProjectCounts(projectId);

  if (project.isPending) return <LoadingState label="Loading the project…" />;
  if (project.isError) return <ErrorState error={project.error} onRetry={() => void project.refetch()} />;

  const ordered = [...(submittals.data ?? [])].sort((a, b) => a.createdAt.localeCompare(b.createdAt));
  const chartData: RevisionCounts[] = ordered.map((s) => {
    const byClass: Partial<Record<FindingClass, number>> = {};
    for (const d of open.data?.items ?? []) {
      if (d.submittalId === s.id && isFindingClass(d.class)) byClass[d.class] = (byClass[d.class] ?? 0) + 1;
    }
    return { label: `#${s.id}`, counts: byClass };
  });
  const summary = chartData
    .map((r) => {
      const parts = FINDING_CLASSES.filter((c) => (r.counts[c] ?? 0) > 0).map(
        (c) => `${r.counts[c]} ${findingClassLabels[c].toLowerCase()}`,
      );
      return `Submittal ${r.label}: ${parts.length ? parts.join(', ') : 'none open'}`;
    })
    .join('. ');

  return (
    <>
      <PageHeader
        eyebrow={project.data.reference ?? 'Project'}
        title={project.data.name}
        description={project.data.description ?? project.data.ownerOrganisation?.name}
        actions={
          <>
            <Button
              icon={<DocumentBulletListRegular />}
              onClick={() => navigate(paths.discrepancies.getHref({ projectId }))}
            >
              Discrepancies
            </Button>
            {(role === 'checker' || role === 'consultant') && (
              <Button
                appearance="primary"
                icon={<ArrowUploadRegular />}
                onClick={() => navigate(paths.upload.getHref(projectId))}
              >
                Upload calc files
              </Button>
            )}
          </>
        }
      />
      <div className={styles.columns}>
        <div>
          <Section title="Submittals and revisions" labelId="submittals-heading">
            {submittals.isPending ? (
              <LoadingState label="Loading submittals…" />
            ) : submittals.isError ? (
              <ErrorState error={submittals.error} onRetry={() => void submittals.refetch()} />
            ) : submittals.data.length === 0 ? (
              <EmptyState title="Nothing submitted yet">
                Upload calc files, or let the consultant's CI submit them with a project token.
              </EmptyState>
            ) : (
              <SubmittalsTable submittals={submittals.data} />
            )}
          </Section>
          <Section title="Activity" labelId="activity-heading">
            <ActivityLog projectId={projectId} />
          </Section>
        </div>
        <div>
          <Section title="Open now, by class" labelId="open-heading">
            {counts.isPending ? (
              <LoadingState />
            ) : counts.isError ? (
              <ErrorState error={counts.error} />
            ) : (
              <ClassCounts counts={counts.data.openByClass} />
            )}
          </Section>
          <Section title="Open findings by class across revisions" labelId="chart-heading">
            {open.isPending || submittals.isPending ? (
              <LoadingState label="Loading the chart…" />
            ) : open.isError ? (
              <ErrorState error={open.error} />
            ) : ordered.length === 0 ? (
              <EmptyState title="No revisions to chart yet" />
            ) : (
              <OpenFindingsChart revisions={chartData} summary={summary} />
            )}
          </Section>
        </div>
      </div>
    </>
  );
}
