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
  Title2,
  tokens,
} from '@fluentui/react-components';
import { ArrowLeftRegular, PrintRegular } from '@fluentui/react-icons';
import { buildDrawing } from 'ligament/draw';
import { codeLabel, formatQuantity, type Dimension } from 'ligament/engine';
import { useNavigate, useParams } from 'react-router-dom';
import { SeverityBadge } from '@/components/finding-badges';
import { LogoMark } from '@/components/logo-mark';
import { ErrorState, LoadingState } from '@/components/states';
import { CAUTION } from 'ligament/engine';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { chainLabel } from '@/lib/units';
import { useMemberResults } from '../api/get-member-results';
import { useReportFiles } from '../api/get-report-files';
import { useSubmittal } from '../api/get-submittal';
import { useSubmittalDiscrepancies } from '../api/get-submittal-discrepancies';
import { useSubmittalFiles } from '../api/get-submittal-files';
import { useOpenServerReport } from '../api/open-server-report';
import { stampActionLabels } from '../api/stamp-submittal';
import { MemberDrawing } from '../components/member-drawing';

const useStyles = makeStyles({
  toolbar: {
    display: 'flex',
    gap: tokens.spacingHorizontalS,
    marginBottom: tokens.spacingVerticalL,
    '@media print': { display: 'none' },
  },
  sheet: {
    backgroundColor: tokens.colorNeutralBackground1,
    padding: tokens.spacingHorizontalXXL,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
    maxWidth: '1000px',
    margin: '0 auto',
    '@media print': { boxShadow: 'none', padding: 0, maxWidth: 'none' },
  },
  head: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    borderBottom: `2px solid ${tokens.colorBrandStroke1}`,
    paddingBottom: tokens.spacingVerticalM,
  },
  caution: {
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke1}`,
    padding: tokens.spacingHorizontalM,
    margin: `${tokens.spacingVerticalM} 0`,
    borderRadius: tokens.borderRadiusMedium,
    fontStyle: 'italic',
  },
  member: { breakInside: 'avoid', marginTop: tokens.spacingVerticalXL },
  facts: {
    display: 'grid',
    gridTemplateColumns: 'max-content 1fr',
    columnGap: tokens.spacingHorizontalL,
    rowGap: tokens.spacingVerticalXXS,
    margin: `${tokens.spacingVerticalS} 0`,
  },
  drawing: { maxWidth: '640px' },
});

export function Component() {
  const styles = useStyles();
  const navigate = useNavigate();
  const submittalId = Number(useParams().submittalId);
  const submittal = useSubmittal(submittalId);
  const files = useSubmittalFiles(submittalId);
  const documents = useReportFiles(files.data?.map((f) => f.id) ?? []);
  const results = useMemberResults(submittalId);
  const discrepancies = useSubmittalDiscrepancies(submittal.data?.projectId, submittalId);
  const serverReport = useOpenServerReport();

  const error = submittal.error ?? files.error ?? documents.error ?? results.error ?? discrepancies.error;
  if (error) return <ErrorState error={error} />;
  if (!submittal.data || !files.data || !documents.data || !results.data || !discrepancies.data)
    return <LoadingState label="Preparing the report…" />;
  const s = submittal.data;

  return (
    <>
      <div className={styles.toolbar}>
        <Button icon={<ArrowLeftRegular />} onClick={() => navigate(paths.submittal.getHref(s.id))}>
          Back to the submittal
        </Button>
        <Button appearance="primary" icon={<PrintRegular />} onClick={() => window.print()}>
          Print
        </Button>
        <Button onClick={() => serverReport.mutate(s.id)} disabled={serverReport.isPending}>
          Open the server's HTML report
        </Button>
      </div>
      <article className={styles.sheet} aria-label="Review report">
        <header className={styles.head}>
          <LogoMark size={36} />
          <div>
            <Title2 as="h1">Review report — submittal #{s.id}</Title2>
            <Text block>
              {s.title} · submitted {formatDateTime(s.createdAt)} by {s.submittedBy} · engine{' '}
              {s.engineVersion}
            </Text>
          </div>
        </header>
        <p className={styles.caution}>{CAUTION}</p>
        <Text block weight="semibold">
          {s.stamp
            ? `Stamp: ${stampActionLabels[s.stamp.action as keyof typeof stampActionLabels] ?? s.stamp.action} — ${s.stamp.stampedBy}, ${formatDateTime(s.stamp.stampedAt)}. ${s.stamp.comment}`
            : 'Not stamped yet.'}
        </Text>
        {s.stamp?.overrideReason && (
          <Text block>Stamped with open errors because: {s.stamp.overrideReason}</Text>
        )}
        <Text block>
          {s.summary.files} files, {s.summary.members} members, {s.summary.findings} findings (
          {s.summary.bySeverity.error} errors, {s.summary.bySeverity.warning} warnings,{' '}
          {s.summary.bySeverity.note} notes); {s.openDiscrepancies} discrepancies open.
        </Text>
        {documents.data.map((file) =>
          file.document.members.map((member) => {
            const row = results.data.find((r) => r.calcFileId === file.id && r.memberId === member.input.id);
            if (!row) return null;
            const r = row.result;
            const units = file.document.profile.units;
            const q = (value: number, dimension: Dimension) => formatQuantity(value, dimension, units);
            const drawing = buildDrawing(member.input, r, {
              units,
              profile: file.document.profile,
              project: file.document.meta.project,
              caution: CAUTION,
            });
            const findings = discrepancies.data.items.filter(
              (d) => d.calcFileId === file.id && d.memberId === member.input.id,
            );
            return (
              <section
                key={`${file.id}-${member.input.id}`}
                className={styles.member}
                aria-label={`Member ${member.input.id}`}
              >
                <Text as="h2" size={500} weight="semibold" block>
                  {member.input.id} <Text weight="regular">({file.fileName})</Text>
                </Text>
                <div className={styles.drawing}>
                  <MemberDrawing drawing={drawing} chains={[]} highlighted={null} />
                </div>
                <div className={styles.facts}>
                  <Text>Code</Text>
                  <Text>{codeLabel(file.document.profile)}</Text>
                  <Text>Ag / An / Ae</Text>
                  <Text>
                    {q(r.Ag, 'area')} / {q(r.An, 'area')} / {q(r.Ae, 'area')}
                    {r.capped ? ' (Ae capped at 0.85 Ag)' : ''}
                  </Text>
                  {r.directions.flatMap((d) => [
                    <Text key={`l${d.direction}`}>Governing chain, load from {d.direction}</Text>,
                    <Text key={`v${d.direction}`}>
                      {d.governing
                        ? `${chainLabel(d.governing.holes)}: wn ${q(d.governing.netWidth, 'length')}`
                        : 'none can form'}
                    </Text>,
                  ])}
                  <Text>Available strength</Text>
                  <Text>
                    {q(r.governing.available, 'force')} ({r.governing.limitState})
                  </Text>
                </div>
                {findings.length > 0 ? (
                  <Table size="small" aria-label={`Findings for ${member.input.id}`}>
                    <TableHeader>
                      <TableRow>
                        <TableHeaderCell>Code</TableHeaderCell>
                        <TableHeaderCell>Severity</TableHeaderCell>
                        <TableHeaderCell>Status</TableHeaderCell>
                        <TableHeaderCell>Finding</TableHeaderCell>
                      </TableRow>
                    </TableHeader>
                    <TableBody>
                      {findings.map((f) => (
                        <TableRow key={f.id}>
                          <TableCell>{f.code}</TableCell>
                          <TableCell>
                            <SeverityBadge severity={f.severity} />
                          </TableCell>
                          <TableCell>{f.status}</TableCell>
                          <TableCell>{f.message}</TableCell>
                        </TableRow>
                      ))}
                    </TableBody>
                  </Table>
                ) : (
                  <Text>No findings.</Text>
                )}
              </section>
            );
          }),
        )}
        <p className={styles.caution}>{CAUTION}</p>
      </article>
    </>
  );
}
