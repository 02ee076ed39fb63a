import {
  Badge,
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
import { ApprovalsAppRegular, ClockRegular } from '@fluentui/react-icons';
import { Link } from 'react-router-dom';
import { HorizontalScroll } from '@/components/horizontal-scroll';
import { paths } from '@/config/paths';
import type { Schema } from '@/lib/api-schemas';
import { formatDateTime } from '@/lib/format';

const useStyles = makeStyles({
  table: { tableLayout: 'auto' },
  badge: { whiteSpace: 'nowrap' },
  num: { textAlign: 'right', fontVariantNumeric: 'tabular-nums' },
  title: { fontWeight: tokens.fontWeightSemibold },
  sub: { display: 'block', color: tokens.colorNeutralForeground3 },
});

const stampLabels: Record<string, string> = {
  'no-exceptions-taken': 'No exceptions taken',
  'make-corrections-noted': 'Make corrections noted',
  'revise-and-resubmit': 'Revise and resubmit',
  rejected: 'Rejected',
};

export interface SubmittalsTableProps {
  readonly submittals: readonly Schema<'SubmittalDto'>[];
}

/** Submittals newest first; a revision names the submittal it revises. */
export function SubmittalsTable({ submittals }: SubmittalsTableProps) {
  const styles = useStyles();
  return (
    <HorizontalScroll label="Submittals and revisions, table" minWidth="640px">
      <Table aria-label="Submittals and revisions" className={styles.table}>
        <TableHeader>
          <TableRow>
            <TableHeaderCell>Submittal</TableHeaderCell>
            <TableHeaderCell>Submitted</TableHeaderCell>
            <TableHeaderCell>Stamp</TableHeaderCell>
            <TableHeaderCell className={styles.num}>Members</TableHeaderCell>
            <TableHeaderCell className={styles.num}>Errors</TableHeaderCell>
            <TableHeaderCell className={styles.num}>Warnings</TableHeaderCell>
            <TableHeaderCell className={styles.num}>Open</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {submittals.map((s) => (
            <TableRow key={s.id}>
              <TableCell>
                <Link className={styles.title} to={paths.submittal.getHref(s.id)}>
                  #{s.id} {s.title}
                </Link>
                <Text size={200} className={styles.sub}>
                  {s.revisionOfId ? `Revises #${s.revisionOfId}` : 'First issue'}
                  {s.revisedBy.length > 0
                    ? ` · revised by ${s.revisedBy.map((id) => `#${id}`).join(', ')}`
                    : ''}
                </Text>
              </TableCell>
              <TableCell>
                {formatDateTime(s.createdAt)}
                <Text size={200} className={styles.sub}>
                  {s.submittedBy}
                  {s.viaApiToken ? ' · via CI token' : ''}
                </Text>
              </TableCell>
              <TableCell>
                {s.stamp ? (
                  <Badge
                    className={styles.badge}
                    appearance="tint"
                    color={s.stamp.action === 'no-exceptions-taken' ? 'success' : 'warning'}
                    icon={<ApprovalsAppRegular />}
                  >
                    {stampLabels[s.stamp.action] ?? s.stamp.action}
                  </Badge>
                ) : (
                  <Badge
                    className={styles.badge}
                    appearance="outline"
                    color="informative"
                    icon={<ClockRegular />}
                  >
                    Awaiting stamp
                  </Badge>
                )}
              </TableCell>
              <TableCell className={styles.num}>{s.summary.members}</TableCell>
              <TableCell className={styles.num}>{s.summary.bySeverity.error}</TableCell>
              <TableCell className={styles.num}>{s.summary.bySeverity.warning}</TableCell>
              <TableCell className={styles.num}>{s.openDiscrepancies}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </HorizontalScroll>
  );
}
