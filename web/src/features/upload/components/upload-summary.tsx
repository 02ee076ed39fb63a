import {
  Button,
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Text,
  tokens,
} from '@fluentui/react-components';
import { useNavigate } from 'react-router-dom';
import { ClassCounts } from '@/components/class-counts';
import { SeverityBadge } from '@/components/finding-badges';
import { paths } from '@/config/paths';
import type { Schema } from '@/lib/api-schemas';
import { plural } from '@/lib/format';

const useStyles = makeStyles({
  body: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  stats: { display: 'flex', gap: tokens.spacingHorizontalL, flexWrap: 'wrap' },
  actions: {
    display: 'flex',
    gap: tokens.spacingHorizontalS,
    flexWrap: 'wrap',
    marginTop: tokens.spacingVerticalS,
  },
});

export interface UploadSummaryProps {
  readonly result: Schema<'UploadResultDto'>;
}

/** What the server found when it recomputed every member of the upload. */
export function UploadSummary({ result }: UploadSummaryProps) {
  const styles = useStyles();
  const navigate = useNavigate();
  const s = result.summary;
  return (
    <MessageBar
      intent={s.bySeverity.error > 0 ? 'warning' : 'success'}
      layout="multiline"
      data-testid="upload-summary"
    >
      <MessageBarBody className={styles.body}>
        <MessageBarTitle>
          Submittal #{result.submittalId} “{result.title}” checked with engine {result.engineVersion}
        </MessageBarTitle>
        <div className={styles.stats}>
          <Text>{plural(s.files, 'file')}</Text>
          <Text>{plural(s.members, 'member')}</Text>
          <Text>{plural(s.findings, 'finding')}</Text>
          <Text>
            {s.bySeverity.error} errors · {s.bySeverity.warning} warnings · {s.bySeverity.note} notes
          </Text>
        </div>
        <ClassCounts counts={s.byClass} emptyText="No findings: every claim agrees with the recomputation." />
        {s.worst && (
          <Text>
            Most serious: <SeverityBadge severity={s.worst.severity} /> {s.worst.code} in {s.worst.fileName}
            {s.worst.memberId ? ` (${s.worst.memberId})` : ''} — {s.worst.message}
          </Text>
        )}
        <div className={styles.actions}>
          <Button appearance="primary" onClick={() => navigate(paths.submittal.getHref(result.submittalId))}>
            Open the submittal
          </Button>
          <Button
            onClick={() =>
              navigate(
                paths.discrepancies.getHref({ projectId: result.projectId, submittalId: result.submittalId }),
              )
            }
          >
            Review its discrepancies
          </Button>
        </div>
      </MessageBarBody>
    </MessageBar>
  );
}
