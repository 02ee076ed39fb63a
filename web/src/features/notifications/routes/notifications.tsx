import { Button, makeStyles, mergeClasses, Switch, Text, tokens } from '@fluentui/react-components';
import {
  AlertRegular,
  CheckmarkRegular,
  ChevronLeftRegular,
  ChevronRightRegular,
} from '@fluentui/react-icons';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { Section } from '@/components/section';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { NOTIFICATIONS_PAGE_SIZE, useNotifications } from '../api/get-notifications';
import { useMarkAllRead } from '../api/mark-all-read';
import { useMarkRead } from '../api/mark-read';

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
    display: 'flex',
    justifyContent: 'space-between',
    alignItems: 'flex-start',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalM,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    borderRadius: tokens.borderRadiusMedium,
    borderLeft: `3px solid ${tokens.colorNeutralStroke2}`,
  },
  unread: {
    backgroundColor: tokens.colorBrandBackground2,
    borderLeft: `3px solid ${tokens.colorBrandStroke1}`,
  },
  text: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
    minWidth: 0,
    flexGrow: 1,
  },
  title: { fontWeight: tokens.fontWeightSemibold },
  body: { whiteSpace: 'pre-wrap', overflowWrap: 'anywhere' },
  meta: { color: tokens.colorNeutralForeground3, fontSize: tokens.fontSizeBase200 },
  tools: {
    display: 'flex',
    justifyContent: 'space-between',
    alignItems: 'center',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalS,
    marginBottom: tokens.spacingVerticalM,
  },
  pager: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    marginTop: tokens.spacingVerticalM,
  },
});

/** What happened to the user's items: newest first; opening one marks it read. */
export function Component() {
  const styles = useStyles();
  const [page, setPage] = useState(1);
  const [unreadOnly, setUnreadOnly] = useState(false);
  const list = useNotifications(page, unreadOnly);
  const markRead = useMarkRead();
  const markAll = useMarkAllRead();
  const unread = list.data?.unread ?? 0;
  const pages = Math.max(1, Math.ceil((list.data?.total ?? 0) / NOTIFICATIONS_PAGE_SIZE));

  return (
    <>
      <PageHeader
        eyebrow="Notifications"
        title="What happened to your items"
        description="Answers, decisions, reopened items and assignments on your projects. Choose what you are told, in the app and by mail, on your Account page."
        actions={
          <Button
            icon={<CheckmarkRegular />}
            onClick={() => markAll.mutate()}
            disabled={unread === 0 || markAll.isPending}
          >
            Mark all read
          </Button>
        }
      />
      <Section>
        <div className={styles.tools}>
          <Text>{unread === 0 ? 'Nothing unread.' : `${unread} unread.`}</Text>
          <Switch
            label="Unread only"
            checked={unreadOnly}
            onChange={(_, d) => {
              setUnreadOnly(d.checked);
              setPage(1);
            }}
          />
        </div>
        {list.isPending ? (
          <LoadingState label="Loading notifications…" />
        ) : list.isError ? (
          <ErrorState error={list.error} onRetry={() => void list.refetch()} />
        ) : list.data.items.length === 0 ? (
          <EmptyState title={unreadOnly ? 'Nothing unread' : 'No notifications yet'} icon={<AlertRegular />}>
            When someone answers, decides on, reopens or assigns one of your items, it shows here.
          </EmptyState>
        ) : (
          <ul
            className={styles.list}
            aria-label="Notifications, newest first"
            data-testid="notification-list"
          >
            {list.data.items.map((n) => (
              <li
                key={n.id}
                className={mergeClasses(styles.item, !n.readAt && styles.unread)}
                data-testid="notification"
              >
                <div className={styles.text}>
                  <Link
                    className={styles.title}
                    to={n.webPath}
                    onClick={() => {
                      if (!n.readAt) markRead.mutate(n.id);
                    }}
                  >
                    {n.title}
                  </Link>
                  <Text className={styles.body}>{n.body}</Text>
                  <Text className={styles.meta}>
                    {formatDateTime(n.createdAt)}
                    {n.readAt ? ` · read ${formatDateTime(n.readAt)}` : ' · unread'}
                    {n.projectId ? (
                      <>
                        {' · '}
                        <Link to={paths.project.getHref(n.projectId)}>project</Link>
                      </>
                    ) : null}
                  </Text>
                </div>
                {!n.readAt && (
                  <Button
                    size="small"
                    onClick={() => markRead.mutate(n.id)}
                    aria-label={`Mark read: ${n.title}`}
                  >
                    Mark read
                  </Button>
                )}
              </li>
            ))}
          </ul>
        )}
        {pages > 1 && (
          <nav className={styles.pager} aria-label="Notification pages">
            <Button icon={<ChevronLeftRegular />} disabled={page <= 1} onClick={() => setPage(page - 1)}>
              Newer
            </Button>
            <Text size={200}>
              page {page} of {pages}
            </Text>
            <Button
              icon={<ChevronRightRegular />}
              iconPosition="after"
              disabled={page >= pages}
              onClick={() => setPage(page + 1)}
            >
              Older
            </Button>
          </nav>
        )}
      </Section>
    </>
  );
}
