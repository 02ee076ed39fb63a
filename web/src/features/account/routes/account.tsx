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
import { KeyRegular } from '@fluentui/react-icons';
import { HorizontalScroll } from '@/components/horizontal-scroll';
import { PageHeader } from '@/components/page-header';
import { Section } from '@/components/section';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { formatDateTime } from '@/lib/format';
import { roleLabel } from '@/lib/roles';
import { useSession } from '@/lib/session';
import { useAccountProjects } from '../api/get-account-projects';
import { useTokens } from '../api/get-tokens';
import { useRevokeToken } from '../api/revoke-token';
import { CiSnippet } from '../components/ci-snippet';
import { CreateTokenForm } from '../components/create-token-form';
import { NotificationSettings } from '../components/notification-settings';

const useStyles = makeStyles({
  facts: {
    display: 'grid',
    gridTemplateColumns: 'max-content 1fr',
    columnGap: tokens.spacingHorizontalL,
    rowGap: tokens.spacingVerticalXS,
  },
  label: { color: tokens.colorNeutralForeground3 },
  mono: { fontFamily: tokens.fontFamilyMonospace },
});

export function Component() {
  const styles = useStyles();
  const session = useSession();
  const isConsultant = session?.user.role === 'consultant';
  const tokens_ = useTokens(isConsultant);
  const projects = useAccountProjects();
  const revoke = useRevokeToken();
  const serverUrl = window.location.origin;
  if (!session) return null;

  return (
    <>
      <PageHeader eyebrow="Account" title={session.user.name} description={session.user.email} />
      <Section title="Signed in" labelId="session-heading">
        <div className={styles.facts}>
          <span className={styles.label}>Role</span>
          <span>{roleLabel(session.user.role)}</span>
          <span className={styles.label}>This browser</span>
          <span>
            Stays signed in across reloads and new tabs until you sign out, or until it goes unused for as
            long as the server allows (a week unless your admin set otherwise). Signing out ends the session
            on the server, for every tab.
          </span>
        </div>
      </Section>
      <Section title="Notifications" labelId="notifications-heading">
        <NotificationSettings />
      </Section>
      {isConsultant ? (
        <>
          <Section title="Personal API tokens for CI" labelId="tokens-heading">
            <Text block>
              A token lets a CI job upload calc files to one project and read its results — nothing else. It
              is shown once when created.
            </Text>
            {projects.isPending ? (
              <LoadingState />
            ) : projects.isError ? (
              <ErrorState error={projects.error} />
            ) : projects.data.length === 0 ? (
              <EmptyState title="You are not on any project">
                An admin adds you to a project; then you can make a token for it.
              </EmptyState>
            ) : (
              <CreateTokenForm projects={projects.data} serverUrl={serverUrl} />
            )}
          </Section>
          <Section title="Your tokens" labelId="token-list-heading">
            {tokens_.isPending ? (
              <LoadingState label="Loading tokens…" />
            ) : tokens_.isError ? (
              <ErrorState error={tokens_.error} onRetry={() => void tokens_.refetch()} />
            ) : tokens_.data.length === 0 ? (
              <EmptyState title="No tokens yet" icon={<KeyRegular />} />
            ) : (
              <HorizontalScroll label="API tokens, table" minWidth="640px">
                <Table aria-label="API tokens">
                  <TableHeader>
                    <TableRow>
                      <TableHeaderCell>Name</TableHeaderCell>
                      <TableHeaderCell>Starts with</TableHeaderCell>
                      <TableHeaderCell>Project</TableHeaderCell>
                      <TableHeaderCell>Created</TableHeaderCell>
                      <TableHeaderCell>Last used</TableHeaderCell>
                      <TableHeaderCell>State</TableHeaderCell>
                    </TableRow>
                  </TableHeader>
                  <TableBody>
                    {tokens_.data.map((t) => (
                      <TableRow key={t.id}>
                        <TableCell>{t.name}</TableCell>
                        <TableCell className={styles.mono}>{t.prefix}…</TableCell>
                        <TableCell>
                          {projects.data?.find((p) => p.id === t.projectId)?.name ?? `#${t.projectId}`}
                        </TableCell>
                        <TableCell>{formatDateTime(t.createdAt)}</TableCell>
                        <TableCell>{t.lastUsedAt ? formatDateTime(t.lastUsedAt) : 'never'}</TableCell>
                        <TableCell>
                          {t.revokedAt ? (
                            `revoked ${formatDateTime(t.revokedAt)}`
                          ) : (
                            <Button
                              size="small"
                              onClick={() => revoke.mutate(t.id)}
                              disabled={revoke.isPending}
                              aria-label={`Revoke ${t.name}`}
                            >
                              Revoke
                            </Button>
                          )}
                        </TableCell>
                      </TableRow>
                    ))}
                  </TableBody>
                </Table>
              </HorizontalScroll>
            )}
          </Section>
          {projects.data?.[0] && (
            <Section title="The CI step" labelId="ci-heading">
              <CiSnippet serverUrl={serverUrl} projectId={projects.data[0].id} />
            </Section>
          )}
        </>
      ) : (
        <Section title="API tokens" labelId="tokens-heading">
          <Text>
            Personal API tokens are for consultants, whose CI submits calc files. Your role works in the app.
          </Text>
        </Section>
      )}
    </>
  );
}
