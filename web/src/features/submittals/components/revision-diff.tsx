import { makeStyles, Subtitle1, Subtitle2, Text, tokens } from '@fluentui/react-components';
import { SeverityBadge } from '@/components/finding-badges';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import type { Schema } from '@/lib/api-schemas';
import { useRevisionDiff } from '../api/get-revision-diff';
import { CalcDiffView } from './calc-diff-view';
import { MeaningDiffView } from './meaning-diff-view';

const useStyles = makeStyles({
  heading: { display: 'block', marginBottom: tokens.spacingVerticalM },
  block: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    marginBottom: tokens.spacingVerticalL,
  },
  columns: {
    display: 'grid',
    gridTemplateColumns: 'repeat(3, minmax(0, 1fr))',
    gap: tokens.spacingHorizontalL,
    '@media (max-width: 900px)': { gridTemplateColumns: '1fr' },
  },
  // By meaning beside the text on a wide screen, above it on a narrow one.
  sides: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 2fr) minmax(0, 3fr)',
    gap: tokens.spacingHorizontalL,
    alignItems: 'start',
    '@media (max-width: 1100px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
  side: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, minWidth: 0 },
  list: {
    margin: 0,
    paddingLeft: tokens.spacingHorizontalL,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
  },
});

function DiscrepancyLine({ d }: { d: Schema<'DiffDiscrepancyDto'> }) {
  return (
    <li>
      <SeverityBadge severity={d.severity} /> {d.code} {d.memberId ?? ''} — {d.message}
    </li>
  );
}

export interface RevisionDiffProps {
  readonly submittalId: number;
}

/** The revision against the submittal it revises: what changed in each calc file, and what that did to the discrepancies. */
export function RevisionDiff({ submittalId }: RevisionDiffProps) {
  const styles = useStyles();
  const diff = useRevisionDiff(submittalId, true);
  if (diff.isPending) return <LoadingState label="Comparing with the previous revision…" />;
  if (diff.isError) return <ErrorState error={diff.error} onRetry={() => void diff.refetch()} />;
  const d = diff.data;
  return (
    <div>
      <Subtitle1 as="h2" className={styles.heading}>
        Changes from submittal #{d.previousSubmittalId}
      </Subtitle1>
      <div className={styles.columns}>
        <div className={styles.block}>
          <Subtitle2 as="h3">Closed ({d.closed.length})</Subtitle2>
          {d.closed.length === 0 ? (
            <Text>None</Text>
          ) : (
            <ul className={styles.list}>
              {d.closed.map((x) => (
                <DiscrepancyLine key={x.id} d={x} />
              ))}
            </ul>
          )}
        </div>
        <div className={styles.block}>
          <Subtitle2 as="h3">Still there ({d.kept.length})</Subtitle2>
          {d.kept.length === 0 ? (
            <Text>None</Text>
          ) : (
            <ul className={styles.list}>
              {d.kept.map((x) => (
                <DiscrepancyLine key={x.current.id} d={x.current} />
              ))}
            </ul>
          )}
        </div>
        <div className={styles.block}>
          <Subtitle2 as="h3">New ({d.opened.length})</Subtitle2>
          {d.opened.length === 0 ? (
            <Text>None</Text>
          ) : (
            <ul className={styles.list}>
              {d.opened.map((x) => (
                <DiscrepancyLine key={x.id} d={x} />
              ))}
            </ul>
          )}
        </div>
      </div>
      {d.files.length === 0 ? (
        <EmptyState title="No files to compare" />
      ) : (
        d.files.map((f, i) => (
          <div key={i} className={styles.block}>
            <Subtitle2 as="h3">
              {f.currentFile ?? f.previousFile} — {f.change}
              {f.previousFile && f.currentFile && f.previousFile !== f.currentFile
                ? ` (was ${f.previousFile})`
                : ''}
            </Subtitle2>
            {f.patch ? (
              <div className={styles.sides}>
                <section className={styles.side} aria-labelledby={`meaning-${i}`}>
                  <Subtitle2 as="h4" id={`meaning-${i}`}>
                    By meaning
                  </Subtitle2>
                  <MeaningDiffView
                    changes={f.changes}
                    label={`Changes by meaning in ${f.currentFile ?? f.previousFile}`}
                  />
                </section>
                <section className={styles.side} aria-labelledby={`text-${i}`}>
                  <Subtitle2 as="h4" id={`text-${i}`}>
                    As text
                  </Subtitle2>
                  <CalcDiffView patch={f.patch} label={`Changes in ${f.currentFile ?? f.previousFile}`} />
                </section>
              </div>
            ) : (
              <Text>No change.</Text>
            )}
          </div>
        ))
      )}
    </div>
  );
}
