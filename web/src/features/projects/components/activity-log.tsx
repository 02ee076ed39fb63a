import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { ChevronLeftRegular, ChevronRightRegular, HistoryRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { roleLabel } from '@/lib/roles';
import { EVENTS_PAGE_SIZE, useProjectEvents } from '../api/get-project-events';
import { describeEvent, groupEvents } from './describe-event';

const useStyles = makeStyles({
  list: {
    listStyleType: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
  },
  item: {
    borderLeft: `3px solid ${tokens.colorBrandStroke2}`,
    paddingLeft: tokens.spacingHorizontalS,
    overflowWrap: 'anywhere',
  },
  meta: { color: tokens.colorNeutralForeground3, fontSize: tokens.fontSizeBase200 },
  who: { fontWeight: tokens.fontWeightSemibold },
  pager: {
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'space-between',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalS,
    marginTop: tokens.spacingVerticalM,
  },
  buttons: { display: 'flex', gap: tokens.spacingHorizontalS },
});

export interface ActivityLogProps {
  readonly projectId: number;
}

/** The project's event log, newest first, a page at a time. */
export function ActivityLog({ projectId }: ActivityLogProps) {
  const styles = useStyles();
  const [page, setPage] = useState<number | 'latest'>('latest');
  const events = useProjectEvents(projectId, page);

  if (events.isPending) return <LoadingState label="Loading the activity…" />;
  if (events.isError)
    return (
      <ErrorState
        error={events.error}
        title="The activity could not be loaded"
        onRetry={() => void events.refetch()}
      />
    );
  const { items, total } = events.data;
  if (total === 0)
    return (
      <EmptyState title="No activity yet" icon={<HistoryRegular />}>
        Uploads, answers, moves, stamps and rechecks will be listed here.
      </EmptyState>
    );
  const current = events.data.page;
  const last = Math.max(1, Math.ceil(total / EVENTS_PAGE_SIZE));
  return (
    <>
      <ol className={styles.list} aria-label="Project activity, newest first" data-testid="activity-log">
        {groupEvents([...items].reverse()).map(({ event: e, count }) => (
          <li key={e.id} className={styles.item}>
            <Text block>
              <span className={styles.who}>{e.actor ? e.actor.name : 'Ligament'}</span>{' '}
              {describeEvent(e, count)}
            </Text>
            <Text className={styles.meta}>
              {formatDateTime(e.at)}
              {e.actor ? ` · ${roleLabel(e.actor.role)}` : ''}
              {e.submittalId && (
                <>
                  {' · '}
                  <Link to={paths.submittal.getHref(e.submittalId)}>submittal #{e.submittalId}</Link>
                </>
              )}
              {e.discrepancyId && count === 1 && (
                <>
                  {' · '}
                  <Link to={paths.discrepancy.getHref(e.discrepancyId)}>discrepancy #{e.discrepancyId}</Link>
                </>
              )}
            </Text>
          </li>
        ))}
      </ol>
      {last > 1 && (
        <nav className={styles.pager} aria-label="Activity pages">
          <Text size={200}>
            {total} events · page {last - current + 1} of {last}
            {events.isFetching ? ' · updating…' : ''}
          </Text>
          <div className={styles.buttons}>
            <Button
              size="small"
              icon={<ChevronLeftRegular />}
              disabled={current >= last}
              onClick={() => setPage(current + 1 >= last ? 'latest' : current + 1)}
            >
              Newer
            </Button>
            <Button
              size="small"
              icon={<ChevronRightRegular />}
              iconPosition="after"
              disabled={current <= 1}
              onClick={() => setPage(current - 1)}
            >
              Older
            </Button>
          </div>
        </nav>
      )}
    </>
  );
}
