import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import type { AuthUser } from '../auth/auth-user.js';
import { randomSecret, sha256Hex } from '../common/hash.js';
import { EventsService } from '../events/events.service.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { User } from '../users/models/user.model.js';
import type { CreatedTokenDto, CreateTokenDto, TokenDto } from './dto/token.dto.js';
import { ApiToken } from './models/api-token.model.js';

export const API_TOKEN_PREFIX = 'lgt_';

/** Personal API tokens for CI: one project each, upload + read only, stored as sha256, revocable. */
@Injectable()
export class TokensService {
  constructor(
    @InjectModel(ApiToken) private readonly tokens: typeof ApiToken,
    @InjectModel(User) private readonly users: typeof User,
    @InjectModel(ProjectMember) private readonly members: typeof ProjectMember,
    private readonly events: EventsService,
  ) {}

  /** The caller a token stands for, or null when the token is unknown, revoked or its owner inactive. */
  async authenticate(token: string): Promise<AuthUser | null> {
    const row = await this.tokens.findOne({ where: { tokenHash: sha256Hex(token) } });
    if (!row || row.revokedAt) return null;
    const user = await this.users.findByPk(row.userId);
    if (!user || !user.active) return null;
    // Membership is checked again on use: a token stops working when its owner leaves the project.
    if (!(await this.members.count({ where: { projectId: row.projectId, userId: user.id } }))) return null;
    await row.update({ lastUsedAt: new Date() });
    return {
      id: user.id,
      email: user.email,
      name: user.name,
      role: user.role,
      organisationId: user.organisationId,
      token: { id: row.id, projectId: row.projectId },
    };
  }

  async create(dto: CreateTokenDto, actor: AuthUser): Promise<CreatedTokenDto> {
    if (!(await this.members.count({ where: { projectId: dto.projectId, userId: actor.id } }))) {
      throw new ForbiddenException('You can create a token only for a project you are a member of.');
    }
    const token = randomSecret(API_TOKEN_PREFIX);
    const row = await this.tokens.create({
      userId: actor.id,
      projectId: dto.projectId,
      name: dto.name,
      tokenHash: sha256Hex(token),
      prefix: token.slice(0, 8),
    });
    await this.events.record({
      type: 'token.created',
      actorId: actor.id,
      projectId: dto.projectId,
      data: { tokenId: row.id, name: dto.name },
    });
    return { ...this.view(row), token };
  }

  async list(actor: AuthUser): Promise<TokenDto[]> {
    const rows = await this.tokens.findAll({ where: { userId: actor.id }, order: [['id', 'DESC']] });
    return rows.map((t) => this.view(t));
  }

  async revoke(id: number, actor: AuthUser): Promise<TokenDto> {
    const row = await this.tokens.findByPk(id);
    if (!row || row.userId !== actor.id) throw new NotFoundException(`You have no token ${id}.`);
    if (!row.revokedAt) {
      await row.update({ revokedAt: new Date() });
      await this.events.record({
        type: 'token.revoked',
        actorId: actor.id,
        projectId: row.projectId,
        data: { tokenId: row.id },
      });
    }
    return this.view(row);
  }

  /**
   * Revokes every live token a user holds for a project: called when the user leaves the project, so
   * a CI secret made while they were a member cannot outlive the membership. Answers the revoked ids.
   */
  async revokeForMembership(
    projectId: number,
    userId: number,
    actor: AuthUser,
    transaction?: Transaction,
  ): Promise<number[]> {
    const live = await this.tokens.findAll({
      where: { projectId, userId, revokedAt: { [Op.is]: null } },
      attributes: ['id'],
      transaction,
    });
    if (live.length === 0) return [];
    const ids = live.map((t) => t.id);
    await this.tokens.update({ revokedAt: new Date() }, { where: { id: { [Op.in]: ids } }, transaction });
    for (const tokenId of ids) {
      await this.events.record(
        {
          type: 'token.revoked',
          actorId: actor.id,
          projectId,
          data: { tokenId, reason: 'member-removed', userId },
        },
        transaction,
      );
    }
    return ids;
  }

  private view(t: ApiToken): TokenDto {
    return {
      id: t.id,
      name: t.name,
      projectId: t.projectId,
      prefix: t.prefix,
      createdAt: new Date(t.createdAt).toISOString(),
      lastUsedAt: t.lastUsedAt ? new Date(t.lastUsedAt).toISOString() : null,
      revokedAt: t.revokedAt ? new Date(t.revokedAt).toISOString() : null,
    };
  }
}
