import { Button, Field, makeStyles, Text, Textarea, tokens } from '@fluentui/react-components';
import { useState } from 'react';
import { useBulkMoveDiscrepancies, type BulkMoveInput } from '../api/bulk-move-discrepancies';

const useStyles = makeStyles({
  bar: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalM,
    alignItems: 'flex-end',
    padding: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalM,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorBrandBackground2,
  },
  note: { flexGrow: 1, minWidth: '220px' },
});

export interface BulkMoveBarProps {
  readonly projectId: number;
  readonly selectedIds: readonly number[];
  readonly onDone: () => void;
}

/** The checker moves every selected discrepancy at once; the server does all or nothing. */
export function BulkMoveBar({ projectId, selectedIds, onDone }: BulkMoveBarProps) {
  const styles = useStyles();
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | undefined>();
  const bulk = useBulkMoveDiscrepancies(projectId);

  const run = (to: BulkMoveInput['to']) => {
    if (to !== 'accepted' && !note.trim()) {
      setError(`Give the reason to ${to === 'waived' ? 'waive' : 'return'} them.`);
      return;
    }
    setError(undefined);
    bulk.mutate(
      { ids: [...selectedIds], to, note: note.trim() || undefined },
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
      <Text weight="semibold">{selectedIds.length} selected</Text>
      <Field className={styles.note} label="Note or reason" validationMessage={error}>
        <Textarea value={note} onChange={(_, d) => setNote(d.value)} rows={1} resize="vertical" />
      </Field>
      <Button onClick={() => run('accepted')} disabled={bulk.isPending}>
        Accept answered
      </Button>
      <Button onClick={() => run('returned')} disabled={bulk.isPending}>
        Return answered
      </Button>
      <Button onClick={() => run('waived')} disabled={bulk.isPending}>
        Waive
      </Button>
    </div>
  );
}
