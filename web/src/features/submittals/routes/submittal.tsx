import {
  Badge,
  Button,
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Tab,
  TabList,
  Subtitle1,
  Text,
  tokens,
} from '@fluentui/react-components';
import { ArrowSyncRegular, DocumentBulletListRegular, PrintRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { HorizontalScroll } from '@/components/horizontal-scroll';
import { PageHeader } from '@/components/page-header';
import { Section } from '@/components/section';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { useServerInfo } from '@/lib/server-info';
import { sessionStore, useSession } from '@/lib/session';
import { useCalcFile } from '../api/get-calc-file';
import { useMemberResults } from '../api/get-member-results';
import { getSubmittalQueryOptions, useSubmittal } from '../api/get-submittal';
import { useSubmittalDiscrepancies } from '../api/get-submittal-discrepancies';
import { getSubmittalFilesQueryOptions, useSubmittalFiles } from '../api/get-submittal-files';
import { useRecheckSubmittal } from '../api/recheck-submittal';
import { stampActionLabels } from '../api/stamp-submittal';
import { MemberPanel } from '../components/member-panel';
import { RecheckResult } from '../components/recheck-result';
import { RevisionDiff } from '../components/revision-diff';
import { StampDialog } from '../components/stamp-dialog';

const useStyles = makeStyles({
  tabs: { marginBottom: tokens.spacingVerticalM },
  memberTabs: { marginBottom: tokens.spacingVerticalS },
  // Tabs keep their names on one line; a row wider than the screen scrolls with a cue (HorizontalScroll).
  tabList: { flexWrap: 'nowrap', width: 'max-content', '& .fui-Tab': { whiteSpace: 'nowrap' } },
  meta: {
    display: 'flex',
    gap: tokens.spacingHorizontalL,
    flexWrap: 'wrap',
    marginBottom: tokens.spacingVerticalM,
  },
  stamp: { marginBottom: tokens.spacingVerticalL },
});

export function loader({ params }: LoaderFunctionArgs) {
  const submittalId = Number(params.submittalId);
  if (sessionStore.get() && Number.isInteger(submittalId)) {
    void queryClient.prefetchQuery(getSubmittalQueryOptions(submittalId));
    void queryClient.prefetchQuery(getSubmittalFilesQueryOptions(submittalId));
  }
  return null;
}

function FileMembers({
  fileId,
  submittalId,
  projectId,
}: {
  fileId: number;
  submittalId: number;
  projectId: number;
}) {
  const styles = useStyles();
  const file = useCalcFile(fileId);
  const results = useMemberResults(submittalId);
  const discrepancies = useSubmittalDiscrepancies(projectId, submittalId);
  const [memberIndex, setMemberIndex] = useState(0);
  if (file.isPending || results.isPending) return <LoadingState label="Loading members…" />;
  if (file.isError) return <ErrorState error={file.error} onRetry={() => void file.refetch()} />;
  if (results.isError) return <ErrorState error={results.error} onRetry={() => void results.refetch()} />;
  const members = file.data.document.members;
  if (members.length === 0) return <EmptyState title="This file has no members" />;
  const member = members[Math.min(memberIndex, members.length - 1)]!;
  const result = results.data.find((r) => r.calcFileId === fileId && r.memberId === member.input.id);
  const findings = (discrepancies.data?.items ?? []).filter(
    (d) => d.calcFileId === fileId && d.memberId === member.input.id,
  );
  return (
    <>
      {members.length > 1 && (
        <HorizontalScroll label="Members in this file" buttons className={styles.memberTabs}>
          <TabList
            className={styles.tabList}
            size="small"
            selectedValue={String(memberIndex)}
            onTabSelect={(_, d) => setMemberIndex(Number(d.value))}
            aria-label="Members in this file"
          >
            {members.map((m, i) => (
              <Tab key={m.input.id} value={String(i)}>
                {m.input.id}
              </Tab>
            ))}
          </TabList>
        </HorizontalScroll>
      )}
      <Subtitle1 as="h2">
        {member.input.id} — {member.description ?? member.input.kind}
      </Subtitle1>
      {result ? (
        <MemberPanel
          document={file.data.document}
          member={member}
          result={result.result}
          findings={findings}
        />
      ) : (
        <EmptyState title="No recomputed result for this member" />
      )}
    </>
  );
}

export function Component() {
  const styles = useStyles();
  const submittalId = Number(useParams().submittalId);
  const navigate = useNavigate();
  const role = useSession()?.user.role;
  const submittal = useSubmittal(submittalId);
  const files = useSubmittalFiles(submittalId);
  const [tab, setTab] = useState<string | null>(null);
  const discrepancies = useSubmittalDiscrepancies(submittal.data?.projectId, submittalId);
  const serverInfo = useServerInfo();
  const recheck = useRecheckSubmittal(submittalId, submittal.data?.projectId ?? 0);
  const engine = serverInfo.data?.engineVersion;

  if (submittal.isPending) return <LoadingState label="Loading the submittal…" />;
  if (submittal.isError)
    return <ErrorState error={submittal.error} onRetry={() => void submittal.refetch()} />;
  const s = submittal.data;
  const openErrors = (discrepancies.data?.items ?? []).filter(
    // As the stamp counts them: current items only (a later revision's carried ones are counted there).
    (d) => d.current && d.severity === 'error' && ['raised', 'answered', 'returned'].includes(d.status),
  ).length;
  const selected = tab ?? (files.data?.[0] ? `file-${files.data[0].id}` : null);

  return (
    <>
      <PageHeader
        eyebrow={`Submittal #${s.id}${s.revisionOfId ? ` · revises #${s.revisionOfId}` : ''}`}
        title={s.title}
        actions={
          <>
            <Button
              icon={<DocumentBulletListRegular />}
              onClick={() =>
                navigate(paths.discrepancies.getHref({ projectId: s.projectId, submittalId: s.id }))
              }
            >
              Discrepancies ({s.openDiscrepancies} open)
            </Button>
            <Button icon={<PrintRegular />} onClick={() => navigate(paths.report.getHref(s.id))}>
              Review report
            </Button>
            {role === 'checker' && (
              <Button
                icon={<ArrowSyncRegular />}
                onClick={() => recheck.mutate()}
                disabled={recheck.isPending}
              >
                {recheck.isPending
                  ? 'Rechecking…'
                  : `Recheck with engine ${engine && engine !== 'unknown' ? engine : 'now running'}`}
              </Button>
            )}
            {role === 'checker' && !s.stamp && (
              <StampDialog submittalId={s.id} projectId={s.projectId} openErrors={openErrors} />
            )}
          </>
        }
      />
      <div className={styles.meta}>
        <Text>
          Submitted {formatDateTime(s.createdAt)} by {s.submittedBy}
          {s.viaApiToken ? ' (CI token)' : ''}
        </Text>
        <Text>Engine {s.engineVersion}</Text>
        <Text>
          {s.summary.files} files · {s.summary.members} members · {s.summary.findings} findings
        </Text>
        <Button
          appearance="transparent"
          size="small"
          onClick={() => navigate(paths.project.getHref(s.projectId))}
        >
          Back to the project
        </Button>
      </div>
      {s.stamp ? (
        <MessageBar
          className={styles.stamp}
          intent={s.stamp.action === 'no-exceptions-taken' ? 'success' : 'warning'}
          layout="multiline"
        >
          <MessageBarBody>
            <MessageBarTitle>
              Stamped: {stampActionLabels[s.stamp.action as keyof typeof stampActionLabels] ?? s.stamp.action}
            </MessageBarTitle>
            {s.stamp.stampedBy}, {formatDateTime(s.stamp.stampedAt)} — {s.stamp.comment}
            {s.stamp.overrideReason ? ` Stamped with open errors because: ${s.stamp.overrideReason}` : ''}
          </MessageBarBody>
        </MessageBar>
      ) : (
        <Badge className={styles.stamp} appearance="outline" color="informative">
          Awaiting the checker's stamp
        </Badge>
      )}
      {(recheck.isPending || recheck.isError || recheck.data) && (
        <Section title="Recheck with the current engine" labelId="recheck-heading">
          {recheck.isPending ? (
            <LoadingState label="Re-running the stored files…" />
          ) : recheck.isError ? (
            <ErrorState
              error={recheck.error}
              title="The recheck did not run"
              onRetry={() => recheck.mutate()}
            />
          ) : (
            recheck.data && <RecheckResult result={recheck.data} />
          )}
        </Section>
      )}
      <Section>
        {files.isPending ? (
          <LoadingState label="Loading files…" />
        ) : files.isError ? (
          <ErrorState error={files.error} onRetry={() => void files.refetch()} />
        ) : files.data.length === 0 ? (
          <EmptyState title="No files in this submittal" />
        ) : (
          <>
            <HorizontalScroll label="Calc files" buttons className={styles.tabs}>
              <TabList
                className={styles.tabList}
                selectedValue={selected}
                onTabSelect={(_, d) => setTab(String(d.value))}
                aria-label="Calc files"
              >
                {files.data.map((f) => (
                  <Tab key={f.id} value={`file-${f.id}`}>
                    {f.fileName} ({f.memberIds.length})
                  </Tab>
                ))}
                {s.revisionOfId && <Tab value="diff">Changes from #{s.revisionOfId}</Tab>}
              </TabList>
            </HorizontalScroll>
            {selected === 'diff' ? (
              <RevisionDiff submittalId={s.id} />
            ) : (
              selected && (
                <FileMembers
                  key={selected}
                  fileId={Number(selected.slice(5))}
                  submittalId={s.id}
                  projectId={s.projectId}
                />
              )
            )}
          </>
        )}
      </Section>
    </>
  );
}
