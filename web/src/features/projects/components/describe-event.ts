import type { Schema } from '@/lib/api-schemas';

type ProjectEvent = Schema<'EventDto'>;

const str = (v: unknown): string | undefined => (typeof v === 'string' && v !== '' ? v : undefined);
const num = (v: unknown): number | undefined => (typeof v === 'number' ? v : undefined);
const count = (n: number | undefined, one: string, many = `${one}s`) =>
  n === undefined ? undefined : `${n} ${n === 1 ? one : many}`;

const stampWords: Record<string, string> = {
  'no-exceptions-taken': 'no exceptions taken',
  'make-corrections-noted': 'make corrections noted',
  'revise-and-resubmit': 'revise and resubmit',
  rejected: 'rejected',
};

/** Events a revision writes one per item; the log shows a run of them as one line. */
const GROUPED = new Set(['discrepancy.carried', 'discrepancy.resolved']);

/** A line of the log: an event, or a run of `count` like events of one revision (the first stands for them). */
export interface LogEntry<E> {
  readonly event: E;
  readonly count: number;
}

/**
 * Folds runs of carried or resolved events of the same revision (in the given order) into one
 * entry each, so a revision of 40 items is one line, not 40.
 */
export function groupEvents<E extends Pick<ProjectEvent, 'type' | 'data' | 'actor'>>(
  events: readonly E[],
): LogEntry<E>[] {
  const out: { event: E; count: number }[] = [];
  for (const e of events) {
    const last = out.at(-1);
    if (
      last &&
      GROUPED.has(e.type) &&
      last.event.type === e.type &&
      last.event.data.revisionSubmittalId === e.data.revisionSubmittalId &&
      (last.event.actor?.id ?? null) === (e.actor?.id ?? null)
    )
      last.count += 1;
    else out.push({ event: e, count: 1 });
  }
  return out;
}

/** One line of the activity log, in words, without the actor (the view shows who separately). */
export function describeEvent(
  event: Pick<ProjectEvent, 'type' | 'data' | 'submittalId' | 'discrepancyId'>,
  many = 1,
): string {
  const d = event.data;
  const submittal = event.submittalId ? `submittal #${event.submittalId}` : 'a submittal';
  const discrepancy = event.discrepancyId ? `discrepancy #${event.discrepancyId}` : 'a discrepancy';
  const note = str(d.note);
  const quoted = note ? ` — “${note}”` : '';
  switch (event.type) {
    case 'submittal.checked':
    case 'submittal.revised': {
      const findings = [
        count(num(d.error), 'error'),
        count(num(d.warning), 'warning'),
        count(num(d.note), 'note'),
      ]
        .filter(Boolean)
        .join(', ');
      const revises = num(d.revisionOf) ? ` as a revision of #${num(d.revisionOf)}` : '';
      const carried = [
        count(num(d.carried), 'item carried on', 'items carried on'),
        count(num(d.resolved), 'resolved', 'resolved'),
      ]
        .filter(Boolean)
        .join(', ');
      return `submitted ${submittal}${str(d.title) ? ` “${str(d.title)}”` : ''}${revises}${
        d.viaApiToken === true ? ' from CI' : ''
      }${findings ? `: ${findings}` : ''}${carried ? `; ${carried}` : ''}`;
    }
    case 'submittal.stamped':
      return `stamped ${submittal} “${stampWords[str(d.action) ?? ''] ?? str(d.action) ?? '?'}”${
        num(d.openErrors) ? ` with ${count(num(d.openErrors), 'open error')}` : ''
      }`.trimEnd();
    case 'submittal.rechecked':
      return `rechecked ${submittal} with engine ${str(d.currentEngineVersion) ?? '?'}: ${
        d.changed === true
          ? [
              count(num(d.valueChanges), 'value changed', 'values changed'),
              count(num(d.newFindings), 'new finding'),
              count(num(d.goneFindings), 'finding gone', 'findings gone'),
            ]
              .filter(Boolean)
              .join(', ')
          : 'nothing changed'
      }`;
    case 'discrepancy.answered': {
      const revision = num(d.revisionSubmittalId);
      return `answered ${discrepancy}${revision ? ` with revision #${revision}` : ''}${quoted}`;
    }
    case 'discrepancy.accepted':
    case 'discrepancy.returned':
    case 'discrepancy.waived':
      return `${event.type.slice('discrepancy.'.length)} ${discrepancy}${d.bulk === true ? ' (bulk)' : ''}${quoted}`;
    case 'discrepancy.reopened':
      return `reopened ${discrepancy} (back to the consultant)${quoted}`;
    case 'discrepancy.resolved':
      return many > 1
        ? `closed ${many} discrepancies: ${str(d.reason) ?? 'resolved by a revision'}`
        : `closed ${discrepancy}: ${str(d.reason) ?? 'resolved by a revision'}`;
    case 'discrepancy.carried': {
      const into = num(d.revisionSubmittalId) ? ` into submittal #${num(d.revisionSubmittalId)}` : '';
      if (many > 1) return `carried ${many} discrepancies${into}`;
      return `carried ${discrepancy}${into}${str(d.reason) ? ` and raised it again (${str(d.reason)})` : ''}`;
    }
    case 'discrepancy.assigned': {
      const due = str(d.dueDate) ? `, due ${str(d.dueDate)}` : '';
      return str(d.assigneeName)
        ? `assigned ${discrepancy} to ${str(d.assigneeName)}${due}`
        : `took the assignee off ${discrepancy}${due}`;
    }
    case 'discrepancy.commented':
      return `commented on ${discrepancy}`;
    case 'discrepancy.acknowledged':
      return `acknowledged ${discrepancy}`;
    case 'project.created':
      return `created the project${str(d.name) ? ` “${str(d.name)}”` : ''}`;
    case 'project.updated':
      return 'updated the project details';
    case 'project.member-added':
      return 'added a project member';
    case 'project.member-removed':
      return 'removed a project member';
    case 'token.created':
      return `created an API token${str(d.name) ? ` “${str(d.name)}”` : ''}`;
    case 'token.revoked':
      return 'revoked an API token';
    default:
      return event.type.replace(/[._-]/g, ' ');
  }
}
