import {
  BadRequestException,
  ConflictException,
  GoneException,
  Inject,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { CAUTION } from 'ligament';
import type { Sequelize } from 'sequelize-typescript';
import { hashPassword } from '../auth/password.js';
import { passwordProblem } from '../auth/password-rules.js';
import type { AuthUser } from '../auth/auth-user.js';
import { randomSecret, sha256Hex } from '../common/hash.js';
import { appConfig, authConfig } from '../config/index.js';
import { EventsService } from '../events/events.service.js';
import { MailService } from '../mail/mail.service.js';
import { Organisation } from '../organisations/models/organisation.model.js';
import type {
  AcceptInvitationDto,
  CreateInvitationDto,
  InvitationDto,
  InvitationPreviewDto,
} from './dto/user.dto.js';
import { Invitation } from './models/invitation.model.js';
import { User } from './models/user.model.js';

export const INVITATION_PREFIX = 'inv_';

export interface CreatedInvitation {
  invitation: InvitationDto;
}

/** Admin invitations: a one-time token mailed as a link; the invitee sets a password with it. */
@Injectable()
export class InvitationsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Invitation) private readonly invitations: typeof Invitation,
    @InjectModel(User) private readonly users: typeof User,
    @InjectModel(Organisation) private readonly organisations: typeof Organisation,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
    @Inject(authConfig.KEY) private readonly auth: ConfigType<typeof authConfig>,
    private readonly mail: MailService,
    private readonly events: EventsService,
  ) {}

  async list(): Promise<InvitationDto[]> {
    const rows = await this.invitations.findAll({ order: [['id', 'DESC']] });
    return rows.map((i) => this.view(i));
  }

  /** Creates the invitation and queues its mail in one transaction; returns the token for tests and the seed. */
  async create(
    dto: CreateInvitationDto,
    actor: AuthUser,
  ): Promise<{ invitation: InvitationDto; token: string }> {
    const email = dto.email.trim().toLowerCase();
    if (await this.users.count({ where: { email } }))
      throw new ConflictException(`${email} already has an account.`);
    if (dto.organisationId !== undefined && !(await this.organisations.findByPk(dto.organisationId))) {
      throw new NotFoundException(`No organisation ${dto.organisationId}.`);
    }
    const token = randomSecret(INVITATION_PREFIX);
    const link = `${this.app.publicUrl}/invitations/${token}`;
    const invitation = await this.sequelize.transaction(async (transaction) => {
      const row = await this.invitations.create(
        {
          email,
          name: dto.name,
          role: dto.role,
          organisationId: dto.organisationId ?? null,
          tokenHash: sha256Hex(token),
          invitedById: actor.id,
          expiresAt: new Date(Date.now() + this.auth.inviteTtlHours * 3600_000),
        },
        { transaction },
      );
      await this.mail.enqueue(
        [
          {
            kind: 'invitation',
            to: email,
            subject: 'You are invited to Ligament',
            text: [
              `Hello ${dto.name},`,
              '',
              `${actor.name} has invited you to Ligament as ${dto.role}.`,
              `Set your password here (the link works once, for ${this.auth.inviteTtlHours} hours):`,
              link,
              '',
              CAUTION,
            ].join('\n'),
          },
        ],
        transaction,
      );
      await this.events.record(
        { type: 'invitation.created', actorId: actor.id, data: { email, role: dto.role } },
        transaction,
      );
      return row;
    });
    return { invitation: this.view(invitation), token };
  }

  async preview(token: string): Promise<InvitationPreviewDto> {
    const invitation = await this.usable(token);
    const organisation = invitation.organisationId
      ? await this.organisations.findByPk(invitation.organisationId)
      : null;
    return {
      email: invitation.email,
      name: invitation.name,
      role: invitation.role,
      organisation: organisation?.name ?? null,
      expiresAt: new Date(invitation.expiresAt).toISOString(),
    };
  }

  async accept(token: string, dto: AcceptInvitationDto): Promise<{ id: number; email: string }> {
    const invitation = await this.usable(token);
    const name = dto.name ?? invitation.name;
    const [local = ''] = invitation.email.split('@');
    const context = [invitation.email, local, ...local.split(/[._+-]/), name, ...name.split(/\s+/)];
    const problem = passwordProblem(dto.password, context);
    if (problem) {
      throw new BadRequestException({
        message: `The password ${problem}.`,
        details: [{ property: 'password', constraints: { passwordRules: `password ${problem}` } }],
      });
    }
    const passwordHash = await hashPassword(dto.password);
    return this.sequelize.transaction(async (transaction) => {
      if (await this.users.count({ where: { email: invitation.email }, transaction })) {
        throw new ConflictException(`${invitation.email} already has an account.`);
      }
      const user = await this.users.create(
        {
          email: invitation.email,
          name,
          role: invitation.role,
          organisationId: invitation.organisationId,
          passwordHash,
          active: true,
        },
        { transaction },
      );
      await invitation.update({ acceptedAt: new Date(), userId: user.id }, { transaction });
      await this.events.record(
        { type: 'invitation.accepted', actorId: user.id, data: { email: user.email } },
        transaction,
      );
      return { id: user.id, email: user.email };
    });
  }

  private async usable(token: string): Promise<Invitation> {
    const invitation = await this.invitations.findOne({ where: { tokenHash: sha256Hex(token) } });
    if (!invitation) throw new NotFoundException('This invitation link is not valid.');
    if (invitation.acceptedAt) throw new GoneException('This invitation has already been used.');
    if (new Date(invitation.expiresAt).getTime() < Date.now())
      throw new GoneException('This invitation has expired; ask for a new one.');
    return invitation;
  }

  private view(i: Invitation): InvitationDto {
    return {
      id: i.id,
      email: i.email,
      name: i.name,
      role: i.role,
      organisationId: i.organisationId,
      expiresAt: new Date(i.expiresAt).toISOString(),
      acceptedAt: i.acceptedAt ? new Date(i.acceptedAt).toISOString() : null,
      createdAt: new Date(i.createdAt).toISOString(),
    };
  }
}
