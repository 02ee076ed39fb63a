import { Role } from '../auth/role.enum.js';

/**
 * Status flow of a discrepancy (names of our own):
 * raised → answered (consultant, with a note or a revision) → accepted | returned (checker);
 * returned → answered again; the checker may waive any open one with a reason.
 */
export type DiscrepancyStatus = 'raised' | 'answered' | 'accepted' | 'returned' | 'waived';
export const DISCREPANCY_STATUSES: readonly DiscrepancyStatus[] = [
  'raised',
  'answered',
  'accepted',
  'returned',
  'waived',
];
/** Statuses that still need work; a stamp is blocked while an error-severity one is in these. */
export const OPEN_STATUSES: readonly DiscrepancyStatus[] = ['raised', 'answered', 'returned'];

export interface StatusMove {
  readonly from: readonly DiscrepancyStatus[];
  readonly to: DiscrepancyStatus;
  readonly role: Role;
  /** What the move must carry: a note, a reason, or a note or a revision link. */
  readonly requires: 'note-or-revision' | 'reason' | 'none';
}

export const STATUS_MOVES: readonly StatusMove[] = [
  { from: ['raised', 'returned'], to: 'answered', role: Role.Consultant, requires: 'note-or-revision' },
  { from: ['answered'], to: 'accepted', role: Role.Checker, requires: 'none' },
  { from: ['answered'], to: 'returned', role: Role.Checker, requires: 'reason' },
  { from: ['raised', 'answered', 'returned'], to: 'waived', role: Role.Checker, requires: 'reason' },
];

/** The move from `from` to `to`, or undefined when the flow has no such move. */
export function findMove(from: DiscrepancyStatus, to: DiscrepancyStatus): StatusMove | undefined {
  return STATUS_MOVES.find((m) => m.to === to && m.from.includes(from));
}
