import { Button, Field, makeStyles, Text, Textarea, tokens } from '@fluentui/react-components';
import { useState } from 'react';
import type { Schema } from '@/lib/api-schemas';
import { useBulkMoveDiscrepancies, type BulkMoveInput } from '../api/bulk-move-discrepancies';
import { statusLabels, type DiscrepancyStatus } from './status-badge';

const useStyles = makeStyles({
  bar: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    padding: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalM,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorBrandBackground2,
  },
  row: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalM, alignItems: 'flex-end' },
  note: { flexGrow: 1, minWidth: '220px' },
  why: { color: tokens.colorNeutralForeground2 },
});

type Row = Schema<'DiscrepancyDto'>;

/**
 * The moves a checker may make on many items at once, and the statuses each starts from (the API's
 * status flow, api/src/discrepancies/discrepancy-status.ts; reopening is one at a time). A move
 * applies to current items only: one a later revision took over is worked on in the revision.
 */
const BULK: readonly { to: BulkMoveInput['to']; label: string; from: readonly DiscrepancyStatus[] }[] = [
  { to: 'accepted', label: 'Accept', from: ['answered'] },
  { to: 'returned', label: 'Return', from: ['answered'] },
  { to: 'waived', label: 'Waive', from: ['raised', 'answered', 'returned'] },
];

/** "raised, answered or returned". */
const words = (list: readonly string[]) =>
  list.length < 2 ? (list[0] ?? '') : `${list.slice(0, -1).join(', ')} or ${list.at(-1)}`;

export interface BulkMoveBarProps {
  readonly projectId: number;
  readonly selected: readonly Row[];
  readonly onDone: () => void;
  /** Keeps only these rows selected (to narrow the selection to the ones a move allows). */
  readonly onNarrow: (ids: Set<number>) => void;
}

/**
 * The checker moves every selected discrepancy at once; the server does all or nothing, so a move
 * is offered only when every selected row allows it, and the bar says which rows stand in the way.
 */
export function BulkMoveBar({ projectId, selected, onDone, onNarrow }: BulkMoveBarProps) {
  const styles = useStyles();
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | undefined>();
  const bulk = useBulkMoveDiscrepancies(projectId);
  const options = BULK.map((m) => {
    const can = selected.filter((d) => d.current && m.from.includes(d.status as DiscrepancyStatus));
    return { ...m, can };
  });

  const run = (to: BulkMoveInput['to']) => {
    if (to !== 'accepted' && !note.trim()) {
      setError(`Give the reason to ${to === 'waived' ? 'waive' : 'return'} them.`);
      return;
    }
    setError(undefined);
    bulk.mutate(
      { ids: selected.map((d) => d.id), to, note: note.trim() || undefined },
      {
        onSuccess: () => {
          setNote('');
          onDone();
        },
      },
    );
  };

  return (
    <div className={styles.bar} role="region" aria-label="Move the selected discrepancies">
      <div className={styles.row}>
        <Text weight="semibold">{selected.length} selected</Text>
        <Field className={styles.note} label="Note or reason" validationMessage={error}>
          <Textarea value={note} onChange={(_, d) => setNote(d.value)} rows={1} resize="vertical" />
        </Field>
        {options.map((m) => (
          <Button
            key={m.to}
            onClick={() => run(m.to)}
            disabled={bulk.isPending || selected.length === 0 || m.can.length < selected.length}
          >
            {`${m.label} ${selected.length}`}
          </Button>
        ))}
      </div>
      {options
        .filter((m) => m.can.length < selected.length)
        .map((m) => (
          <div key={m.to} className={styles.row}>
            <Text size={200} className={styles.why}>
              {`${m.label}: ${selected.length - m.can.length} of ${selected.length} selected ${
                selected.length - m.can.length === 1 ? 'is' : 'are'
              } not ${words(m.from.map((s) => statusLabels[s].toLowerCase()))}${
                selected.some((d) => !d.current) ? ' (or a later revision took them over)' : ''
              }.`}
            </Text>
            {m.can.length > 0 && (
              <Button
                size="small"
                appearance="subtle"
                onClick={() => onNarrow(new Set(m.can.map((d) => d.id)))}
              >
                {`Keep the ${m.can.length} that can be moved`}
              </Button>
            )}
          </div>
        ))}
    </div>
  );
}
