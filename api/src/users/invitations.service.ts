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
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { hashPassword } from '../auth/password.js';
import { passwordProblem } from '../auth/password-rules.js';
import type { AuthUser } from '../auth/auth-user.js';
import { ROLE_NAMES } from '../auth/role.enum.js';
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
  InvitationState,
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
    const { row, token } = await this.sequelize.transaction(async (transaction) => {
      const issued = await this.issue(
        { email, name: dto.name, role: dto.role, organisationId: dto.organisationId ?? null },
        actor,
        'sent',
        transaction,
      );
      await this.events.record(
        {
          type: 'invitation.created',
          actorId: actor.id,
          data: { invitationId: issued.row.id, email, role: dto.role },
        },
        transaction,
      );
      return issued;
    });
    return { invitation: this.view(row), token };
  }

  /**
   * Sends a waiting or expired invitation again with a new link: a new invitation (new token, new
   * expiry) replaces the old one, whose link stops working. Accepted, revoked or replaced: 409.
   */
  async resend(id: number, actor: AuthUser): Promise<{ invitation: InvitationDto; token: string }> {
    const { row, token } = await this.sequelize.transaction(async (transaction) => {
      const old = await this.invitations.findByPk(id, { transaction });
      if (!old) throw new NotFoundException(`No invitation ${id}.`);
      this.mustBeOpen(old, 'resent');
      if (await this.users.count({ where: { email: old.email }, transaction }))
        throw new ConflictException(`${old.email} already has an account.`);
      const issued = await this.issue(
        { email: old.email, name: old.name, role: old.role, organisationId: old.organisationId },
        actor,
        'resent',
        transaction,
      );
      const [moved] = await this.invitations.update(
        { replacedById: issued.row.id },
        { where: { id, acceptedAt: null, revokedAt: null, replacedById: null }, transaction },
      );
      if (moved !== 1) throw new ConflictException(`Invitation ${id} changed meanwhile; reload the list.`);
      await this.events.record(
        {
          type: 'invitation.resent',
          actorId: actor.id,
          data: { invitationId: id, replacedById: issued.row.id, email: old.email },
        },
        transaction,
      );
      return issued;
    });
    return { invitation: this.view(row), token };
  }

  /** Withdraws an invitation that has not been accepted: its link stops working. */
  async revoke(id: number, actor: AuthUser): Promise<InvitationDto> {
    return this.sequelize.transaction(async (transaction) => {
      const invitation = await this.invitations.findByPk(id, { transaction });
      if (!invitation) throw new NotFoundException(`No invitation ${id}.`);
      this.mustBeOpen(invitation, 'revoked');
      await invitation.update({ revokedAt: new Date(), revokedById: actor.id }, { transaction });
      await this.events.record(
        {
          type: 'invitation.revoked',
          actorId: actor.id,
          data: { invitationId: id, email: invitation.email },
        },
        transaction,
      );
      return this.view(invitation);
    });
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
      // Compare-and-set: an admin revoking or resending it meanwhile wins, and no account is made.
      const [taken] = await this.invitations.update(
        { acceptedAt: new Date(), userId: user.id },
        {
          where: { id: invitation.id, acceptedAt: null, revokedAt: null, replacedById: null },
          transaction,
        },
      );
      if (taken !== 1) throw new GoneException('This invitation was withdrawn or sent again meanwhile.');
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
    const dead: Record<Exclude<InvitationState, 'waiting'>, string> = {
      accepted: 'This invitation has already been used to set up an account: sign in instead.',
      revoked: 'This invitation was withdrawn by an admin; ask them if you still need an account.',
      replaced: 'This invitation was sent again with a new link; use the link in the latest e-mail.',
      expired: 'This invitation has expired; ask an admin to send it again.',
    };
    const state = invitationState(invitation);
    if (state !== 'waiting') throw new GoneException({ message: dead[state], details: [{ state }] });
    return invitation;
  }

  /** 409 unless the invitation is waiting or expired (what can still be resent or revoked). */
  private mustBeOpen(invitation: Invitation, action: 'resent' | 'revoked'): void {
    const state = invitationState(invitation);
    const why: Partial<Record<InvitationState, string>> = {
      accepted: `it was accepted; deactivate the user instead`,
      revoked: 'it was revoked; invite them again',
      replaced: `it was replaced by invitation ${invitation.replacedById}`,
    };
    const reason = why[state];
    if (reason)
      throw new ConflictException({
        message: `Invitation ${invitation.id} cannot be ${action}: ${reason}.`,
        details: [{ id: invitation.id, state }],
      });
  }

  /** A new invitation row and its mail, in the caller's transaction. */
  private async issue(
    who: Pick<Invitation, 'email' | 'name' | 'role' | 'organisationId'>,
    actor: AuthUser,
    how: 'sent' | 'resent',
    transaction: Transaction,
  ): Promise<{ row: Invitation; token: string }> {
    const token = randomSecret(INVITATION_PREFIX);
    const link = `${this.app.publicUrl}/invitations/${token}`;
    const row = await this.invitations.create(
      {
        ...who,
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
          to: who.email,
          subject:
            how === 'sent' ? 'You are invited to Ligament' : 'Your Ligament invitation, with a new link',
          text: [
            `Hello ${who.name},`,
            '',
            `${actor.name} has invited you to Ligament as ${ROLE_NAMES[who.role].toLowerCase()}.`,
            ...(how === 'resent' ? ['This is a new link: the one sent before no longer works.'] : []),
            `Set your password here (the link works once, for ${this.auth.inviteTtlHours} hours):`,
            link,
            '',
            CAUTION,
          ].join('\n'),
        },
      ],
      transaction,
    );
    return { row, token };
  }

  private view(i: Invitation): InvitationDto {
    return {
      id: i.id,
      email: i.email,
      name: i.name,
      role: i.role,
      organisationId: i.organisationId,
      state: invitationState(i),
      expiresAt: new Date(i.expiresAt).toISOString(),
      acceptedAt: i.acceptedAt ? new Date(i.acceptedAt).toISOString() : null,
      revokedAt: i.revokedAt ? new Date(i.revokedAt).toISOString() : null,
      replacedById: i.replacedById ?? null,
      createdAt: new Date(i.createdAt).toISOString(),
    };
  }
}

/** Where an invitation stands: only a waiting one's link works. */
export function invitationState(
  i: Pick<Invitation, 'acceptedAt' | 'revokedAt' | 'replacedById' | 'expiresAt'>,
  now = Date.now(),
): InvitationState {
  if (i.acceptedAt) return 'accepted';
  if (i.revokedAt) return 'revoked';
  if (i.replacedById) return 'replaced';
  return new Date(i.expiresAt).getTime() < now ? 'expired' : 'waiting';
}
