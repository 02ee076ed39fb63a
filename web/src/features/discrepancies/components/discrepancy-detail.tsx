import {
  Button,
  Divider,
  Field,
  Input,
  makeStyles,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  MessageBarTitle,
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
import type { Schema } from '@/lib/api-schemas';
import { formatDateTime } from '@/lib/format';
import { roleLabel } from '@/lib/roles';
import { useAcknowledgeDiscrepancy } from '../api/acknowledge-discrepancy';
import { assignInputSchema, useAssignDiscrepancy } from '../api/assign-discrepancy';
import { commentInputSchema, useCommentOnDiscrepancy } from '../api/comment-discrepancy';
import { useDiscrepancy } from '../api/get-discrepancy';
import { useAssignablePeople } from '../api/get-project-people';
import { useRevisionCandidates } from '../api/get-revision-candidates';
import { moveInputSchema, useMoveDiscrepancy } from '../api/move-discrepancy';
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
  assign: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 3fr) minmax(0, 2fr)',
    gap: tokens.spacingHorizontalS,
    alignItems: 'end',
  },
});

type Move = Schema<'MoveOptionDto'>;

/** The button of each move, by its name (a reopen lands on returned but is not a return). */
const moveVerb: Record<Move['action'], string> = {
  answer: 'Answer',
  accept: 'Accept',
  return: 'Return',
  waive: 'Waive',
  reopen: 'Reopen',
};
const noteLabel: Record<Move['action'], string> = {
  answer: 'Your answer (what was changed, or why the claim stands; optional with a linked revision)',
  accept: 'Note (optional)',
  return: 'Why it goes back to the consultant',
  waive: 'Why it is waived',
  reopen: 'Why it is reopened (the consultant reads this)',
};

function eventText(type: string, data: Record<string, unknown>): string {
  const to = typeof data.to === 'string' ? data.to : undefined;
  const note =
    typeof data.note === 'string' ? data.note : typeof data.reason === 'string' ? data.reason : undefined;
  const quoted = note ? ` — “${note}”` : '';
  switch (type) {
    case 'discrepancy.resolved':
      return `closed it: ${note ?? 'resolved by a revision'}`;
    case 'discrepancy.carried':
      return `carried it into submittal #${String(data.revisionSubmittalId)} from #${String(data.fromDiscrepancyId)}${
        to ? `, ${to}` : ''
      }${note ? ` (raised again: ${note})` : ''}`;
    case 'discrepancy.reopened':
      return `reopened it (back to returned)${quoted}`;
    case 'discrepancy.assigned': {
      const who =
        typeof data.assigneeName === 'string'
          ? `assigned it to ${data.assigneeName}`
          : 'took the assignee off';
      return `${who}${typeof data.dueDate === 'string' ? `, due ${data.dueDate}` : ', no due date'}`;
    }
    default: {
      const verb = type.replace(/^discrepancy\./, '').replace(/-/g, ' ');
      return `${to ? `moved to ${to}` : verb}${quoted}`;
    }
  }
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
  /** Shows a close button in the panel (the drawer has its own in its header). */
  readonly onClose?: () => void;
  /** Opens another item (the one this continues, or continues into) in place; else a link to its page. */
  readonly onOpenOther?: (id: number) => void;
}

/** Who has it and by when; the checker changes it (native controls: the detail may sit in a modal drawer). */
function AssignmentEditor({
  discrepancyId,
  projectId,
  assigneeId,
  dueDate,
  version,
}: {
  discrepancyId: number;
  projectId: number;
  assigneeId: number | null;
  dueDate: string | null;
  /** The item's version as shown: a change made on an older one is refused and said so. */
  version: number;
}) {
  const styles = useStyles();
  const people = useAssignablePeople(projectId, true);
  const assign = useAssignDiscrepancy(discrepancyId, projectId);
  const [who, setWho] = useState(assigneeId === null ? '' : String(assigneeId));
  const [due, setDue] = useState(dueDate ?? '');
  const [error, setError] = useState<string | undefined>();
  const changed = who !== (assigneeId === null ? '' : String(assigneeId)) || due !== (dueDate ?? '');
  const save = () => {
    const parsed = assignInputSchema.safeParse({
      assigneeId: who ? Number(who) : null,
      dueDate: due || null,
    });
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message);
      return;
    }
    setError(undefined);
    assign.mutate({ ...parsed.data, version });
  };
  return (
    <>
      <div className={styles.assign}>
        <Field label="Assigned to">
          <Select value={who} onChange={(_, d) => setWho(d.value)} disabled={people.isPending}>
            <option value="">No one</option>
            {(people.data ?? []).map((p) => (
              <option key={p.id} value={String(p.id)}>
                {`${p.name} (${p.role})`}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Due date" validationMessage={error}>
          <Input type="date" value={due} onChange={(_, d) => setDue(d.value)} />
        </Field>
      </div>
      <div>
        <Button onClick={save} disabled={!changed || assign.isPending}>
          {assign.isPending ? 'Saving…' : 'Save assignment'}
        </Button>
      </div>
      {assign.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>{describeError(assign.error)}</MessageBarBody>
        </MessageBar>
      )}
    </>
  );
}

/**
 * One discrepancy: what it is, who has it, its history and comments (with those of the items it
 * continues across revisions), and the moves the caller's role may make now.
 */
export function DiscrepancyDetail({
  discrepancyId,
  projectId,
  onClose,
  onOpenOther,
}: DiscrepancyDetailProps) {
  const styles = useStyles();
  const detail = useDiscrepancy(discrepancyId);
  const move = useMoveDiscrepancy(discrepancyId, projectId);
  const comment = useCommentOnDiscrepancy(discrepancyId);
  const acknowledge = useAcknowledgeDiscrepancy(discrepancyId, projectId);
  const [pending, setPending] = useState<Move | null>(null);
  const [note, setNote] = useState('');
  const [revisionId, setRevisionId] = useState<number | undefined>();
  const [noteError, setNoteError] = useState<string | undefined>();
  const [commentBody, setCommentBody] = useState('');
  const [commentError, setCommentError] = useState<string | undefined>();

  if (detail.isPending) return <LoadingState label="Loading the discrepancy…" />;
  if (detail.isError) return <ErrorState error={detail.error} onRetry={() => void detail.refetch()} />;
  const d = detail.data;
  const moves = d.moves;
  const other = (id: number, label: string) =>
    onOpenOther ? (
      <Button size="small" appearance="secondary" onClick={() => onOpenOther(id)}>
        {label}
      </Button>
    ) : (
      <Link to={paths.discrepancy.getHref(id)}>{label}</Link>
    );
  const earlier = new Map(d.lineage.filter((l) => l.id !== d.id).map((l) => [l.id, l]));

  const sendMove = () => {
    if (!pending) return;
    const parsed = moveInputSchema.safeParse({
      to: pending.to,
      note: note.trim() || undefined,
      revisionSubmittalId: pending.action === 'answer' ? revisionId : undefined,
    });
    if (!parsed.success) {
      setNoteError(parsed.error.issues[0]?.message);
      return;
    }
    setNoteError(undefined);
    move.mutate(
      { ...parsed.data, action: pending.action, version: d.version },
      {
        onSuccess: () => {
          setPending(null);
          setNote('');
          setRevisionId(undefined);
        },
      },
    );
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
      {!d.current && (
        <MessageBar intent="info" layout="multiline" data-testid="superseded-note">
          <MessageBarBody>
            <MessageBarTitle>
              {d.resolution
                ? `Closed: ${d.resolution}`
                : `Superseded by submittal #${d.supersededBySubmittalId}`}
            </MessageBarTitle>
            {d.resolution
              ? 'The revision re-checked this member and no longer raises it. Nothing more to do here.'
              : `The revision still raises it; the work goes on in its item${
                  d.carriedInto ? ` #${d.carriedInto.id}` : ''
                }, which keeps this history.`}
          </MessageBarBody>
          {d.carriedInto && (
            <MessageBarActions>{other(d.carriedInto.id, `Open #${d.carriedInto.id}`)}</MessageBarActions>
          )}
        </MessageBar>
      )}
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
        {d.lineage.length > 1 && (
          <>
            <span className={styles.label}>Carried from</span>
            <span>
              {d.lineage
                .filter((l) => l.id !== d.id)
                .map((l) => `#${l.id} in submittal #${l.submittalId}`)
                .join(', ')}{' '}
              · first raised {formatDateTime(d.firstRaisedAt)}
            </span>
          </>
        )}
        {!d.canAssign && (d.assignee || d.dueDate) && (
          <>
            <span className={styles.label}>Assigned · due</span>
            <span>
              {d.assignee?.name ?? 'no one'} · {d.dueDate ?? 'no due date'}
            </span>
          </>
        )}
      </div>

      {(moves.length > 0 || d.canAcknowledge) && (
        <>
          <Divider />
          <Subtitle2 as="h3">Your moves</Subtitle2>
          <div className={styles.moves}>
            {moves.map((m) => (
              <Button
                key={m.action}
                appearance={pending?.action === m.action ? 'primary' : 'secondary'}
                onClick={() => setPending(m)}
                aria-pressed={pending?.action === m.action}
              >
                {moveVerb[m.action]}
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
                label={noteLabel[pending.action]}
                required={
                  pending.requires !== 'none' && !(pending.action === 'answer' && revisionId !== undefined)
                }
                validationMessage={noteError}
              >
                <Textarea value={note} onChange={(_, v) => setNote(v.value)} rows={3} resize="vertical" />
              </Field>
              {pending.action === 'answer' && (
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
                    : `${moveVerb[pending.action]}: move to ${statusLabels[pending.to as DiscrepancyStatus]}`}
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

      {d.canAssign && (
        <>
          <Divider />
          <Subtitle2 as="h3">Who and by when</Subtitle2>
          <AssignmentEditor
            key={`${d.assignee?.id ?? ''}|${d.dueDate ?? ''}`}
            discrepancyId={d.id}
            projectId={projectId}
            assigneeId={d.assignee?.id ?? null}
            dueDate={d.dueDate}
            version={d.version}
          />
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
      {d.canComment && (
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
              {e.discrepancyId !== null && earlier.has(e.discrepancyId) && (
                <span className={styles.meta}>
                  {` · on #${e.discrepancyId} in submittal #${earlier.get(e.discrepancyId)?.submittalId}`}
                </span>
              )}
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
