import { Role } from '../auth/role.enum.js';

/**
 * Status flow of a discrepancy (names of our own):
 * raised → answered (consultant, with a note or a revision) → accepted | returned (checker);
 * returned → answered again; the checker may waive any open one with a reason, and reopen an
 * accepted or waived one with a note: it goes back to the consultant as returned.
 * resolved: closed by a revision that re-checked the member and no longer raises it (no person
 * moves an item there, and no move leads out of it; see discrepancy-identity.ts).
 */
export type DiscrepancyStatus = 'raised' | 'answered' | 'accepted' | 'returned' | 'waived' | 'resolved';
export const DISCREPANCY_STATUSES: readonly DiscrepancyStatus[] = [
  'raised',
  'answered',
  'accepted',
  'returned',
  'waived',
  'resolved',
];
/** Statuses that still need work; a stamp is blocked while an error-severity one is in these. */
export const OPEN_STATUSES: readonly DiscrepancyStatus[] = ['raised', 'answered', 'returned'];

/** What a person does to a discrepancy; `to` is where it lands. */
export type MoveAction = 'answer' | 'accept' | 'return' | 'waive' | 'reopen';

export interface StatusMove {
  readonly action: MoveAction;
  readonly from: readonly DiscrepancyStatus[];
  readonly to: DiscrepancyStatus;
  readonly role: Role;
  /** What the move must carry: a note, a reason, or a note or a revision link. */
  readonly requires: 'note-or-revision' | 'reason' | 'none';
  /** Whether the checker may make it on many at once (bulk move). */
  readonly bulk: boolean;
}

/**
 * Reopen lands on returned, not raised: a checker reopens an accepted or waived item because the
 * consultant has something to do again, and the reopening note says what (as a return's reason
 * does). The consultant is told, and answers it as any returned item.
 */
export const STATUS_MOVES: readonly StatusMove[] = [
  {
    action: 'answer',
    from: ['raised', 'returned'],
    to: 'answered',
    role: Role.Consultant,
    requires: 'note-or-revision',
    bulk: false,
  },
  { action: 'accept', from: ['answered'], to: 'accepted', role: Role.Checker, requires: 'none', bulk: true },
  {
    action: 'return',
    from: ['answered'],
    to: 'returned',
    role: Role.Checker,
    requires: 'reason',
    bulk: true,
  },
  {
    action: 'waive',
    from: ['raised', 'answered', 'returned'],
    to: 'waived',
    role: Role.Checker,
    requires: 'reason',
    bulk: true,
  },
  {
    action: 'reopen',
    from: ['accepted', 'waived'],
    to: 'returned',
    role: Role.Checker,
    requires: 'reason',
    bulk: false,
  },
];

/** The move from `from` to `to`, or undefined when the flow has no such move. */
export function findMove(from: DiscrepancyStatus, to: DiscrepancyStatus): StatusMove | undefined {
  return STATUS_MOVES.find((m) => m.to === to && m.from.includes(from));
}

/** Statuses a bulk move may lead to. */
export const BULK_TARGETS = [...new Set(STATUS_MOVES.filter((m) => m.bulk).map((m) => m.to))];
