import {
  Button,
  Divider,
  Field,
  makeStyles,
  MessageBar,
  MessageBarBody,
  Select,
  Spinner,
  Subtitle2,
  Text,
  Textarea,
  tokens,
} from '@fluentui/react-components';
import { DismissRegular, EyeRegular } from '@fluentui/react-icons';
import { quantityText } from 'ligament/engine';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { ClassBadge, SeverityBadge } from '@/components/finding-badges';
import { ErrorState, LoadingState } from '@/components/states';
import { paths } from '@/config/paths';
import { describeError } from '@/lib/api-error';
import { formatDateTime } from '@/lib/format';
import { roleLabel } from '@/lib/roles';
import { useAcknowledgeDiscrepancy } from '../api/acknowledge-discrepancy';
import { commentInputSchema, useCommentOnDiscrepancy } from '../api/comment-discrepancy';
import { useDiscrepancy } from '../api/get-discrepancy';
import { useRevisionCandidates } from '../api/get-revision-candidates';
import { moveInputSchema, moveNeedsNote, useMoveDiscrepancy, type MoveInput } from '../api/move-discrepancy';
import { StatusBadge, statusLabels, type DiscrepancyStatus } from './status-badge';

const useStyles = makeStyles({
  panel: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM, minWidth: 0 },
  head: {
    display: 'flex',
    justifyContent: 'space-between',
    alignItems: 'flex-start',
    gap: tokens.spacingHorizontalS,
  },
  badges: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS, alignItems: 'center' },
  code: {
    fontFamily: tokens.fontFamilyMonospace,
    fontWeight: tokens.fontWeightSemibold,
    fontSize: tokens.fontSizeBase400,
  },
  facts: {
    display: 'grid',
    gridTemplateColumns: 'max-content minmax(0, 1fr)',
    columnGap: tokens.spacingHorizontalM,
    rowGap: tokens.spacingVerticalXXS,
  },
  label: { color: tokens.colorNeutralForeground3 },
  mono: { fontFamily: tokens.fontFamilyMonospace, wordBreak: 'break-all' },
  moves: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS },
  list: {
    listStyleType: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
  },
  item: { borderLeft: `3px solid ${tokens.colorBrandStroke2}`, paddingLeft: tokens.spacingHorizontalS },
  meta: { color: tokens.colorNeutralForeground3, fontSize: tokens.fontSizeBase200 },
});

const moveVerb: Record<MoveInput['to'], string> = {
  answered: 'Answer',
  accepted: 'Accept',
  returned: 'Return',
  waived: 'Waive',
};
const noteLabel: Record<MoveInput['to'], string> = {
  answered: 'Your answer (what was changed, or why the claim stands; optional with a linked revision)',
  accepted: 'Note (optional)',
  returned: 'Why it goes back to the consultant',
  waived: 'Why it is waived',
};

function eventText(type: string, data: Record<string, unknown>): string {
  const to = typeof data.to === 'string' ? data.to : undefined;
  const note =
    typeof data.note === 'string' ? data.note : typeof data.reason === 'string' ? data.reason : undefined;
  const verb = type.replace(/^discrepancy\./, '').replace(/-/g, ' ');
  return `${to ? `moved to ${to}` : verb}${note ? ` — “${note}”` : ''}`;
}

const NO_REVISION = 'none';

/** The answer's optional link to a revision: only submittals uploaded as a revision of this one. */
function RevisionPicker({
  projectId,
  submittalId,
  value,
  onChange,
}: {
  projectId: number;
  submittalId: number;
  value: number | undefined;
  onChange: (id: number | undefined) => void;
}) {
  const candidates = useRevisionCandidates(projectId, submittalId, true);
  if (candidates.isPending) return <Spinner size="tiny" label="Looking for revisions…" />;
  if (candidates.isError)
    return <ErrorState error={candidates.error} title="The revisions could not be listed" />;
  if (candidates.data.length === 0)
    return (
      <Text size={200}>
        No revision of submittal #{submittalId} yet. Upload the corrected files as a revision of #
        {submittalId} to link them to the answer.
      </Text>
    );
  return (
    <Field label="Revision that answers it" hint="Later submittals uploaded as a revision of this one.">
      {/* A native select: the detail may sit in a modal drawer, where a popup list would open outside it. */}
      <Select
        value={value === undefined ? NO_REVISION : String(value)}
        onChange={(_, d) => onChange(d.value === NO_REVISION ? undefined : Number(d.value))}
      >
        <option value={NO_REVISION}>No revision</option>
        {candidates.data.map((s) => (
          <option key={s.id} value={String(s.id)}>
            {`#${s.id} ${s.title} · ${formatDateTime(s.createdAt)}`}
          </option>
        ))}
      </Select>
    </Field>
  );
}

function linkedRevision(data: Record<string, unknown>): number | undefined {
  return typeof data.revisionSubmittalId === 'number' ? data.revisionSubmittalId : undefined;
}

export interface DiscrepancyDetailProps {
  readonly discrepancyId: number;
  readonly projectId: number;
  /** Shows a close button; a modal drawer that has its own leaves it out. */
  readonly onClose?: () => void;
  /** Consultants and checkers comment; other roles read. */
  readonly canComment: boolean;
}

/** One discrepancy: what it is, its history and comments, and the moves the caller's role may make now. */
export function DiscrepancyDetail({ discrepancyId, projectId, onClose, canComment }: DiscrepancyDetailProps) {
  const styles = useStyles();
  const detail = useDiscrepancy(discrepancyId);
  const move = useMoveDiscrepancy(discrepancyId, projectId);
  const comment = useCommentOnDiscrepancy(discrepancyId);
  const acknowledge = useAcknowledgeDiscrepancy(discrepancyId, projectId);
  const [pending, setPending] = useState<MoveInput['to'] | null>(null);
  const [note, setNote] = useState('');
  const [revisionId, setRevisionId] = useState<number | undefined>();
  const [noteError, setNoteError] = useState<string | undefined>();
  const [commentBody, setCommentBody] = useState('');
  const [commentError, setCommentError] = useState<string | undefined>();

  if (detail.isPending) return <LoadingState label="Loading the discrepancy…" />;
  if (detail.isError) return <ErrorState error={detail.error} onRetry={() => void detail.refetch()} />;
  const d = detail.data;
  const moves = d.allowedMoves.filter((m): m is MoveInput['to'] => m !== 'raised');

  const sendMove = () => {
    if (!pending) return;
    const parsed = moveInputSchema.safeParse({
      to: pending,
      note: note.trim() || undefined,
      revisionSubmittalId: pending === 'answered' ? revisionId : undefined,
    });
    if (!parsed.success) {
      setNoteError(parsed.error.issues[0]?.message);
      return;
    }
    setNoteError(undefined);
    move.mutate(parsed.data, {
      onSuccess: () => {
        setPending(null);
        setNote('');
        setRevisionId(undefined);
      },
    });
  };

  const sendComment = () => {
    const parsed = commentInputSchema.safeParse({ body: commentBody });
    if (!parsed.success) {
      setCommentError(parsed.error.issues[0]?.message);
      return;
    }
    setCommentError(undefined);
    comment.mutate(parsed.data, { onSuccess: () => setCommentBody('') });
  };

  return (
    <div
      className={styles.panel}
      aria-label={`Discrepancy ${d.id}`}
      role="region"
      data-testid="discrepancy-detail"
    >
      <div className={styles.head}>
        <div className={styles.badges}>
          <span className={styles.code}>{d.code}</span>
          <Text>{d.name}</Text>
        </div>
        {onClose && (
          <Button
            appearance="subtle"
            icon={<DismissRegular />}
            aria-label="Close the details"
            onClick={onClose}
          />
        )}
      </div>
      <div className={styles.badges}>
        <StatusBadge status={d.status} />
        <SeverityBadge severity={d.severity} />
        <ClassBadge findingClass={d.class} />
        {d.acknowledgedAt && (
          <Text size={200}>acknowledged by the owner's rep {formatDateTime(d.acknowledgedAt)}</Text>
        )}
      </div>
      <Text>{d.message}</Text>
      <div className={styles.facts}>
        <span className={styles.label}>Submittal</span>
        <Link to={paths.submittal.getHref(d.submittalId)}>
          #{d.submittalId} {d.submittalTitle}
        </Link>
        <span className={styles.label}>File · member</span>
        <span>
          {d.fileName} · {d.memberId ?? '—'}
          {d.direction ? ` · load from ${d.direction}` : ''}
        </span>
        {d.chain.length > 0 && (
          <>
            <span className={styles.label}>Holes</span>
            <span className={styles.mono}>{d.chain.join(' – ')}</span>
          </>
        )}
        {(d.claimed !== null || d.recomputed !== null) && (
          <>
            <span className={styles.label}>Claimed · recomputed</span>
            <span>
              {quantityText(d.claimed, d.quantity, d.units)} ·{' '}
              {quantityText(d.recomputed, d.quantity, d.units)}
            </span>
          </>
        )}
        <span className={styles.label}>Pointer</span>
        <span className={styles.mono}>{d.pointer}</span>
        <span className={styles.label}>Raised</span>
        <span>
          {formatDateTime(d.createdAt)} by {d.raisedBy}
        </span>
      </div>

      {(moves.length > 0 || d.canAcknowledge) && (
        <>
          <Divider />
          <Subtitle2 as="h3">Your moves</Subtitle2>
          <div className={styles.moves}>
            {moves.map((to) => (
              <Button
                key={to}
                appearance={pending === to ? 'primary' : 'secondary'}
                onClick={() => setPending(to)}
                aria-pressed={pending === to}
              >
                {moveVerb[to]}
              </Button>
            ))}
            {d.canAcknowledge && (
              <Button
                icon={<EyeRegular />}
                onClick={() => acknowledge.mutate()}
                disabled={acknowledge.isPending}
              >
                Acknowledge
              </Button>
            )}
          </div>
          {pending && (
            <>
              <Field
                label={noteLabel[pending]}
                required={moveNeedsNote[pending] && !(pending === 'answered' && revisionId !== undefined)}
                validationMessage={noteError}
              >
                <Textarea value={note} onChange={(_, v) => setNote(v.value)} rows={3} resize="vertical" />
              </Field>
              {pending === 'answered' && (
                <RevisionPicker
                  projectId={projectId}
                  submittalId={d.submittalId}
                  value={revisionId}
                  onChange={setRevisionId}
                />
              )}
              <div className={styles.moves}>
                <Button appearance="primary" onClick={sendMove} disabled={move.isPending}>
                  {move.isPending
                    ? 'Saving…'
                    : `${moveVerb[pending]}: move to ${statusLabels[pending as DiscrepancyStatus]}`}
                </Button>
                <Button appearance="subtle" onClick={() => setPending(null)}>
                  Cancel
                </Button>
              </div>
              {move.isError && (
                <MessageBar intent="error" role="alert">
                  <MessageBarBody>{describeError(move.error)}</MessageBarBody>
                </MessageBar>
              )}
            </>
          )}
        </>
      )}

      <Divider />
      <Subtitle2 as="h3">Comments ({d.comments.length})</Subtitle2>
      {d.comments.length === 0 ? (
        <Text className={styles.meta}>No comments yet.</Text>
      ) : (
        <ul className={styles.list}>
          {d.comments.map((c) => (
            <li key={c.id} className={styles.item}>
              <Text block>{c.body}</Text>
              <Text className={styles.meta}>
                {c.author} ({c.authorRole}) · {formatDateTime(c.at)}
              </Text>
            </li>
          ))}
        </ul>
      )}
      {canComment && (
        <>
          <Field label="Add a comment" validationMessage={commentError}>
            <Textarea
              value={commentBody}
              onChange={(_, v) => setCommentBody(v.value)}
              rows={2}
              resize="vertical"
            />
          </Field>
          <div>
            <Button onClick={sendComment} disabled={comment.isPending}>
              {comment.isPending ? 'Posting…' : 'Post comment'}
            </Button>
          </div>
        </>
      )}

      <Divider />
      <Subtitle2 as="h3">History</Subtitle2>
      <ol className={styles.list}>
        {d.history.map((e) => (
          <li key={e.id} className={styles.item}>
            <Text block>
              {e.actor ? `${e.actor.name} (${roleLabel(e.actor.role)})` : 'Ligament'}{' '}
              {eventText(e.type, e.data)}
              {linkedRevision(e.data) !== undefined && (
                <>
                  {' · revision '}
                  <Link to={paths.submittal.getHref(linkedRevision(e.data)!)}>#{linkedRevision(e.data)}</Link>
                </>
              )}
            </Text>
            <Text className={styles.meta}>{formatDateTime(e.at)}</Text>
          </li>
        ))}
      </ol>
    </div>
  );
}
