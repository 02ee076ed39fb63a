import { Role } from '../auth/role.enum.js';

/** What a person is told about; each kind can be turned off, in the app and by mail separately. */
export type NotificationKind = 'answered' | 'returned' | 'accepted' | 'waived' | 'reopened' | 'assigned';

export interface NotificationKindInfo {
  readonly kind: NotificationKind;
  /** Words for the Account page. */
  readonly label: string;
  readonly description: string;
  /** Whose kind it is (the Account page shows a user the kinds of their role). */
  readonly roles: readonly Role[];
}

/**
 * Who is told what: a consultant when a checker decides on an item (returned, accepted, waived,
 * reopened), a checker when a consultant answers, anyone when an item is assigned to them.
 */
export const NOTIFICATION_KINDS: readonly NotificationKindInfo[] = [
  {
    kind: 'answered',
    label: 'Answered',
    description: 'A consultant answered a discrepancy on your project.',
    roles: [Role.Checker],
  },
  {
    kind: 'returned',
    label: 'Returned',
    description: 'A checker sent a discrepancy back with a reason.',
    roles: [Role.Consultant],
  },
  {
    kind: 'accepted',
    label: 'Accepted',
    description: 'A checker accepted an answer.',
    roles: [Role.Consultant],
  },
  {
    kind: 'waived',
    label: 'Waived',
    description: 'A checker waived a discrepancy with a reason.',
    roles: [Role.Consultant],
  },
  {
    kind: 'reopened',
    label: 'Reopened',
    description: 'A checker reopened an accepted or waived discrepancy.',
    roles: [Role.Consultant],
  },
  {
    kind: 'assigned',
    label: 'Assigned to you',
    description: 'A discrepancy was assigned to you, or its due date changed.',
    roles: [Role.Consultant, Role.Checker],
  },
];

export const NOTIFICATION_KIND_NAMES = NOTIFICATION_KINDS.map((k) => k.kind);

/** The kind a status move tells people about. */
export const KIND_OF_MOVE: Record<string, NotificationKind | undefined> = {
  answer: 'answered',
  return: 'returned',
  accept: 'accepted',
  waive: 'waived',
  reopen: 'reopened',
};
