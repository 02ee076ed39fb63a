import { initialSchema } from './0001-initial-schema.js';
import { discrepancySeverityIndex } from './0002-discrepancy-severity-index.js';
import { discrepancyTallies } from './0003-discrepancy-tallies.js';
import { versionsAndHeartbeat } from './0004-versions-and-heartbeat.js';
import { revisionsAssignmentsNotifications } from './0005-revisions-assignments-notifications.js';
import { sessionsAndInvitationRevocation } from './0006-sessions-and-invitation-revocation.js';
import { discrepancyUnits } from './0007-discrepancy-units.js';

/** Every migration, in order. Add new ones at the end; never edit one that has shipped. */
export const migrations = [
  initialSchema,
  discrepancySeverityIndex,
  discrepancyTallies,
  versionsAndHeartbeat,
  revisionsAssignmentsNotifications,
  sessionsAndInvitationRevocation,
  discrepancyUnits,
];
