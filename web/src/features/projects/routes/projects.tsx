import { Button, Card, CardHeader, makeStyles, Text, tokens } from '@fluentui/react-components';
import { BuildingBankRegular, ArrowUploadRegular } from '@fluentui/react-icons';
import { Link, useNavigate } from 'react-router-dom';
import { ClassCounts } from '@/components/class-counts';
import { PageHeader } from '@/components/page-header';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { paths } from '@/config/paths';
import type { Schema } from '@/lib/api-schemas';
import { plural } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { sessionStore, useSession } from '@/lib/session';
import { useProjectCounts } from '../api/get-dashboard-counts';
import { getProjectsQueryOptions, useProjects } from '../api/get-projects';

const useStyles = makeStyles({
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(340px, 1fr))',
    gap: tokens.spacingHorizontalL,
  },
  card: { padding: tokens.spacingHorizontalL, gap: tokens.spacingVerticalM },
  name: {
    color: tokens.colorNeutralForeground1,
    fontWeight: tokens.fontWeightSemibold,
    fontSize: tokens.fontSizeBase400,
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}` },
  },
  stats: { display: 'flex', gap: tokens.spacingHorizontalXL },
  stat: { display: 'flex', flexDirection: 'column' },
  statValue: {
    fontSize: tokens.fontSizeBase600,
    fontWeight: tokens.fontWeightSemibold,
    fontVariantNumeric: 'tabular-nums',
  },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS, flexWrap: 'wrap' },
});

export function loader() {
  if (sessionStore.get()) void queryClient.prefetchQuery(getProjectsQueryOptions());
  return null;
}

function ProjectCard({ project }: { project: Schema<'ProjectDto'> }) {
  const styles = useStyles();
  const counts = useProjectCounts(project.id);
  const role = useSession()?.user.role;
  return (
    <Card className={styles.card} data-testid="project-card">
      <CardHeader
        image={<BuildingBankRegular fontSize={28} aria-hidden />}
        header={
          <Link className={styles.name} to={paths.project.getHref(project.id)}>
            {project.name}
          </Link>
        }
        description={
          <Text size={200}>
            {[project.reference, project.ownerOrganisation?.name].filter(Boolean).join(' · ') ||
              'No reference'}
          </Text>
        }
      />
      <div className={styles.stats}>
        <div className={styles.stat}>
          <span className={styles.statValue}>{project.openDiscrepancyCount}</span>
          <Text size={200}>open discrepancies</Text>
        </div>
        <div className={styles.stat}>
          <span className={styles.statValue}>{project.submittalCount}</span>
          <Text size={200}>{project.submittalCount === 1 ? 'submittal' : 'submittals'}</Text>
        </div>
      </div>
      {counts.isPending ? (
        <Text size={200}>Counting open findings…</Text>
      ) : counts.isError ? (
        <Text size={200}>Counts by class are unavailable.</Text>
      ) : (
        <ClassCounts counts={counts.data.openByClass} />
      )}
      <div className={styles.actions}>
        <Link to={paths.discrepancies.getHref({ projectId: project.id, status: 'open' })}>
          Open discrepancies
        </Link>
        {(role === 'checker' || role === 'consultant') && (
          <Link to={paths.upload.getHref(project.id)}>
            <ArrowUploadRegular aria-hidden /> Upload
          </Link>
        )}
      </div>
    </Card>
  );
}

export function Component() {
  const styles = useStyles();
  const projects = useProjects();
  const role = useSession()?.user.role;
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        eyebrow="Projects"
        title="Your projects"
        description={
          projects.data ? plural(projects.data.length, 'project') + ' you are a member of.' : undefined
        }
        actions={
          role === 'admin' ? (
            <Button appearance="secondary" onClick={() => navigate(paths.admin.getHref())}>
              Manage projects
            </Button>
          ) : undefined
        }
      />
      {projects.isPending ? (
        <LoadingState label="Loading projects…" />
      ) : projects.isError ? (
        <ErrorState error={projects.error} onRetry={() => void projects.refetch()} />
      ) : projects.data.length === 0 ? (
        <EmptyState title="No projects yet" icon={<BuildingBankRegular />}>
          An admin adds you to a project; it will show here with its open discrepancies.
        </EmptyState>
      ) : (
        <div className={styles.grid}>
          {projects.data.map((project) => (
            <ProjectCard key={project.id} project={project} />
          ))}
        </div>
      )}
    </>
  );
}
