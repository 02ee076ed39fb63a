import { CalcFile } from '../calc-files/models/calc-file.model.js';
import { DiscrepancyComment } from '../discrepancies/models/discrepancy-comment.model.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { Event } from '../events/models/event.model.js';
import { MailboxMessage } from '../mail/models/mailbox-message.model.js';
import { OutboxMessage } from '../mail/models/outbox-message.model.js';
import { NotificationSetting } from '../notifications/models/notification-setting.model.js';
import { Notification } from '../notifications/models/notification.model.js';
import { Organisation } from '../organisations/models/organisation.model.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { Project } from '../projects/models/project.model.js';
import { MemberResult } from '../results/models/member-result.model.js';
import { RefreshToken } from '../sessions/models/refresh-token.model.js';
import { Session } from '../sessions/models/session.model.js';
import { Submittal } from '../submittals/models/submittal.model.js';
import { ApiToken } from '../tokens/models/api-token.model.js';
import { Invitation } from '../users/models/invitation.model.js';
import { User } from '../users/models/user.model.js';

/** Every model; the tables themselves come from the migrations. */
export const MODELS = [
  Organisation,
  User,
  Invitation,
  Project,
  ProjectMember,
  ApiToken,
  Submittal,
  CalcFile,
  MemberResult,
  Discrepancy,
  DiscrepancyComment,
  Event,
  OutboxMessage,
  MailboxMessage,
  Session,
  RefreshToken,
  Notification,
  NotificationSetting,
];
