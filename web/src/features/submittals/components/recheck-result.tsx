import {
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Subtitle2,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  tokens,
} from '@fluentui/react-components';
import { quantityText } from 'ligament/engine';
import { HorizontalScroll } from '@/components/horizontal-scroll';
import type { Schema } from '@/lib/api-schemas';
import { plural } from '@/lib/format';

type Recheck = Schema<'RecheckDto'>;
type RecheckFinding = Schema<'RecheckFindingDto'>;

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  num: { textAlign: 'right', fontVariantNumeric: 'tabular-nums' },
  code: { fontFamily: tokens.fontFamilyMonospace, fontWeight: tokens.fontWeightSemibold },
  pre: {
    fontFamily: tokens.fontFamilyMonospace,
    fontSize: tokens.fontSizeBase200,
    whiteSpace: 'pre-wrap',
    margin: 0,
  },
});

function FindingTable({ label, findings }: { label: string; findings: readonly RecheckFinding[] }) {
  const styles = useStyles();
  return (
    <HorizontalScroll label={`${label}, table`} minWidth="560px">
      <Table size="small" aria-label={label}>
        <TableHeader>
          <TableRow>
            <TableHeaderCell>Code</TableHeaderCell>
            <TableHeaderCell>File · member</TableHeaderCell>
            <TableHeaderCell>Severity</TableHeaderCell>
            <TableHeaderCell>Finding</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {findings.map((f, i) => (
            <TableRow key={`${f.fileName}-${f.memberId ?? ''}-${f.code}-${f.chain ?? ''}-${i}`}>
              <TableCell className={styles.code}>{f.code}</TableCell>
              <TableCell>
                {f.fileName} · {f.memberId ?? '—'}
              </TableCell>
              <TableCell>{f.severity}</TableCell>
              <TableCell>{f.message}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </HorizontalScroll>
  );
}

export interface RecheckResultProps {
  readonly result: Recheck;
}

/** What a recheck with the current engine found against the stored results. */
export function RecheckResult({ result }: RecheckResultProps) {
  const styles = useStyles();
  const sameEngine = result.storedEngineVersion === result.currentEngineVersion;
  return (
    <div className={styles.root} data-testid="recheck-result">
      <MessageBar intent={result.changed ? 'warning' : 'success'} layout="multiline">
        <MessageBarBody>
          <MessageBarTitle>
            {result.changed ? 'The current engine gives different results' : 'Nothing changed'}
          </MessageBarTitle>
          Stored with engine {result.storedEngineVersion}, rechecked with engine {result.currentEngineVersion}
          {sameEngine ? ' (the same version)' : ''}. {plural(result.valueChanges.length, 'value')} changed,{' '}
          {plural(result.newFindings.length, 'new finding')}, {plural(result.goneFindings.length, 'finding')}{' '}
          gone, {result.unchangedFindings} unchanged. The stored results and discrepancies are kept as they
          were; upload a revision to raise new ones.
        </MessageBarBody>
      </MessageBar>
      {result.loadErrors.length > 0 && (
        <MessageBar intent="error" layout="multiline">
          <MessageBarBody>
            <MessageBarTitle>
              {plural(result.loadErrors.length, 'stored file error')}: the current loader refuses the files
            </MessageBarTitle>
            <pre className={styles.pre}>{result.loadErrors.map((e) => JSON.stringify(e)).join('\n')}</pre>
          </MessageBarBody>
        </MessageBar>
      )}
      {result.valueChanges.length > 0 && (
        <>
          <Subtitle2 as="h3">Values that changed</Subtitle2>
          <HorizontalScroll label="Values that changed, table" minWidth="480px">
            <Table size="small" aria-label="Values that changed">
              <TableHeader>
                <TableRow>
                  <TableHeaderCell>File · member</TableHeaderCell>
                  <TableHeaderCell>Value</TableHeaderCell>
                  <TableHeaderCell className={styles.num}>Stored</TableHeaderCell>
                  <TableHeaderCell className={styles.num}>Now</TableHeaderCell>
                </TableRow>
              </TableHeader>
              <TableBody>
                {result.valueChanges.map((v) => (
                  <TableRow key={`${v.fileName}-${v.memberId}-${v.field}`}>
                    <TableCell>
                      {v.fileName} · {v.memberId}
                    </TableCell>
                    <TableCell>{v.field}</TableCell>
                    <TableCell className={styles.num}>
                      {quantityText(v.stored, v.quantity, v.units)}
                    </TableCell>
                    <TableCell className={styles.num}>
                      {quantityText(v.current, v.quantity, v.units)}
                    </TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          </HorizontalScroll>
        </>
      )}
      {result.newFindings.length > 0 && (
        <>
          <Subtitle2 as="h3">New findings</Subtitle2>
          <FindingTable label="New findings" findings={result.newFindings} />
        </>
      )}
      {result.goneFindings.length > 0 && (
        <>
          <Subtitle2 as="h3">Findings the current engine no longer raises</Subtitle2>
          <FindingTable label="Findings no longer raised" findings={result.goneFindings} />
        </>
      )}
      {!result.changed && (
        <Text>Every stored value and all {result.unchangedFindings} findings are reproduced.</Text>
      )}
    </div>
  );
}
