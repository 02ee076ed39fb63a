import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { AuthUser } from '../auth/auth-user.js';
import { Role } from '../auth/role.enum.js';
import { appConfig } from '../config/index.js';
import { MailService } from '../mail/mail.service.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { User } from '../users/models/user.model.js';
import type {
  NotificationDto,
  NotificationPageDto,
  NotificationSettingDto,
  UpdateNotificationSettingsDto,
} from './dto/notification.dto.js';
import { Notification } from './models/notification.model.js';
import { NotificationSetting } from './models/notification-setting.model.js';
import { NOTIFICATION_KINDS, type NotificationKind } from './notification-kinds.js';

/** A person to tell. */
export interface Recipient {
  readonly id: number;
  readonly email: string;
  readonly name: string;
}

/** One thing that happened, told to each recipient once, in the app and by mail as each has chosen. */
export interface Notice {
  readonly kind: NotificationKind;
  readonly recipients: readonly Recipient[];
  readonly actor: AuthUser | null;
  readonly projectId: number | null;
  readonly projectName: string;
  readonly submittalId: number | null;
  readonly discrepancyId: number | null;
  /** One line: what happened, e.g. "Tomasz Quell returned LG101 on SP-1". */
  readonly title: string;
  /** Which item and what came with it (the note), in a few lines. */
  readonly lines: readonly string[];
  /** Path in the web app, e.g. /discrepancies/12. */
  readonly webPath: string;
}

const CAUTION =
  'Ligament is a checking aid. The engineer of record decides; the governing code and local requirements apply.';

/**
 * The in-app list and the mail of what happened to a user's items. `notify` runs inside the
 * transaction of the change it tells about (the change's compare-and-set makes it happen once), so
 * each recipient gets exactly one notification and one mail (through the outbox) per event.
 */
@Injectable()
export class NotificationsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Notification) private readonly notifications: typeof Notification,
    @InjectModel(NotificationSetting) private readonly settings: typeof NotificationSetting,
    @InjectModel(ProjectMember) private readonly members: typeof ProjectMember,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
    private readonly mail: MailService,
  ) {}

  /** Active members of a project with one of these roles. */
  async projectPeople(
    projectId: number,
    roles: readonly Role[],
    transaction?: Transaction,
  ): Promise<Recipient[]> {
    const rows = await this.members.findAll({
      where: { projectId },
      include: [
        {
          model: User,
          where: { role: { [Op.in]: [...roles] }, active: true },
          attributes: ['id', 'email', 'name'],
        },
      ],
      order: [['userId', 'ASC']],
      transaction,
    });
    return rows.flatMap((m) => (m.user ? [{ id: m.user.id, email: m.user.email, name: m.user.name }] : []));
  }

  async notify(notice: Notice, transaction: Transaction): Promise<void> {
    const seen = new Set<number>();
    const recipients = notice.recipients.filter((r) => {
      // Nobody is told about what they did themselves; nobody twice.
      if (r.id === notice.actor?.id || seen.has(r.id)) return false;
      seen.add(r.id);
      return true;
    });
    if (recipients.length === 0) return;
    const chosen = await this.settings.findAll({
      where: { userId: { [Op.in]: recipients.map((r) => r.id) }, kind: notice.kind },
      transaction,
    });
    const choice = new Map(chosen.map((c) => [c.userId, c]));
    const inApp = recipients.filter((r) => choice.get(r.id)?.inApp ?? true);
    const byMail = recipients.filter((r) => choice.get(r.id)?.mail ?? true);
    await this.notifications.bulkCreate(
      inApp.map((r) => ({
        userId: r.id,
        kind: notice.kind,
        projectId: notice.projectId,
        submittalId: notice.submittalId,
        discrepancyId: notice.discrepancyId,
        actorId: notice.actor?.id ?? null,
        title: notice.title,
        body: notice.lines.join('\n'),
        webPath: notice.webPath,
        readAt: null,
      })),
      { transaction },
    );
    const info = NOTIFICATION_KINDS.find((k) => k.kind === notice.kind);
    await this.mail.enqueue(
      byMail.map((r) => ({
        kind: `discrepancy-${notice.kind}` as const,
        to: r.email,
        subject: `${notice.title} · ${notice.projectName}`,
        text: [
          `Hello ${r.name},`,
          '',
          `${notice.title}.`,
          ...notice.lines,
          '',
          `Open it: ${this.app.publicUrl}${notice.webPath}`,
          '',
          `You get this mail for "${info?.label ?? notice.kind}" on ${notice.projectName}. Choose what you are told on your Account page: ${this.app.publicUrl}/account`,
          '',
          CAUTION,
        ].join('\n'),
      })),
      transaction,
    );
  }

  async list(
    user: AuthUser,
    page: number,
    pageSize: number,
    unreadOnly: boolean,
  ): Promise<NotificationPageDto> {
    const where = { userId: user.id, ...(unreadOnly ? { readAt: null } : {}) };
    const [{ rows, count }, unread] = await Promise.all([
      this.notifications.findAndCountAll({
        where,
        include: [{ model: User, as: 'actor', attributes: ['id', 'name', 'role'] }],
        order: [['id', 'DESC']],
        limit: pageSize,
        offset: (page - 1) * pageSize,
      }),
      this.unread(user),
    ]);
    return { items: rows.map((n) => this.view(n)), total: count, page, pageSize, unread };
  }

  unread(user: AuthUser): Promise<number> {
    return this.notifications.count({ where: { userId: user.id, readAt: null } });
  }

  /** Marks one read (idempotent: a read one keeps its first read time). */
  async markRead(user: AuthUser, id: number): Promise<NotificationDto> {
    const found = await this.notifications.findOne({ where: { id, userId: user.id }, attributes: ['id'] });
    if (!found) throw new NotFoundException(`You have no notification ${id}.`);
    await this.notifications.update({ readAt: new Date() }, { where: { id, userId: user.id, readAt: null } });
    const n = await this.notifications.findByPk(id, {
      include: [{ model: User, as: 'actor', attributes: ['id', 'name', 'role'] }],
    });
    return this.view(n as Notification);
  }

  async markAllRead(user: AuthUser): Promise<number> {
    const [marked] = await this.notifications.update(
      { readAt: new Date() },
      { where: { userId: user.id, readAt: null } },
    );
    return marked;
  }

  /** The kinds of the user's role, each with the user's choice (both on unless turned off). */
  async getSettings(user: AuthUser): Promise<NotificationSettingDto[]> {
    const rows = await this.settings.findAll({ where: { userId: user.id } });
    const byKind = new Map(rows.map((r) => [r.kind, r]));
    return NOTIFICATION_KINDS.filter((k) => k.roles.includes(user.role)).map((k) => ({
      kind: k.kind,
      label: k.label,
      description: k.description,
      inApp: byKind.get(k.kind)?.inApp ?? true,
      mail: byKind.get(k.kind)?.mail ?? true,
    }));
  }

  async updateSettings(
    user: AuthUser,
    dto: UpdateNotificationSettingsDto,
  ): Promise<NotificationSettingDto[]> {
    await this.sequelize.transaction(async (transaction) => {
      for (const s of dto.settings) {
        await this.settings.upsert(
          { userId: user.id, kind: s.kind, inApp: s.inApp, mail: s.mail },
          { transaction },
        );
      }
    });
    return this.getSettings(user);
  }

  private view(n: Notification): NotificationDto {
    return {
      id: n.id,
      kind: n.kind,
      title: n.title,
      body: n.body,
      webPath: n.webPath,
      projectId: n.projectId,
      submittalId: n.submittalId,
      discrepancyId: n.discrepancyId,
      actor: n.actor ? { id: n.actor.id, name: n.actor.name, role: n.actor.role } : null,
      readAt: n.readAt ? new Date(n.readAt).toISOString() : null,
      createdAt: new Date(n.createdAt).toISOString(),
    };
  }
}
