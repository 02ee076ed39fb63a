import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { HotReadsService } from '../database/hot-reads.service.js';
import { EventsService } from '../events/events.service.js';
import { Organisation } from '../organisations/models/organisation.model.js';
import { SessionsService } from '../sessions/sessions.service.js';
import type { AuthUser } from '../auth/auth-user.js';
import type { UpdateUserDto, UserDto } from './dto/user.dto.js';
import { User } from './models/user.model.js';

@Injectable()
export class UsersService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(User) private readonly users: typeof User,
    @InjectModel(Organisation) private readonly organisations: typeof Organisation,
    private readonly reads: HotReadsService,
    private readonly sessions: SessionsService,
    private readonly events: EventsService,
  ) {}

  /**
   * The caller behind a user id, if the user exists, is active, has a password (accepted its
   * invitation) and the session `sessionId` is theirs and has not ended.
   */
  async findActive(id: number, sessionId: number): Promise<AuthUser | null> {
    // Runs on every signed-in request: a prepared statement on the read connection.
    const row = await this.reads.get<AuthUser>(
      `SELECT u.id, u.email, u.name, u.role, u.organisationId FROM users u
       JOIN sessions s ON s.id = ? AND s.userId = u.id AND s.endedAt IS NULL
       WHERE u.id = ? AND u.active = 1 AND u.passwordHash IS NOT NULL`,
      [sessionId, id],
    );
    return row
      ? { id: row.id, email: row.email, name: row.name, role: row.role, organisationId: row.organisationId }
      : null;
  }

  findByEmail(email: string): Promise<User | null> {
    return this.users.findOne({ where: { email: email.trim().toLowerCase() } });
  }

  toAuthUser(user: User): AuthUser {
    return {
      id: user.id,
      email: user.email,
      name: user.name,
      role: user.role,
      organisationId: user.organisationId,
    };
  }

  async list(): Promise<UserDto[]> {
    const rows = await this.users.findAll({ include: [Organisation], order: [['id', 'ASC']] });
    return rows.map((u) => this.view(u));
  }

  async get(id: number): Promise<UserDto> {
    const user = await this.users.findByPk(id, { include: [Organisation] });
    if (!user) throw new NotFoundException(`No user ${id}.`);
    return this.view(user);
  }

  async update(id: number, dto: UpdateUserDto, actor: AuthUser): Promise<UserDto> {
    const user = await this.users.findByPk(id);
    if (!user) throw new NotFoundException(`No user ${id}.`);
    if (id === actor.id && (dto.active === false || (dto.role && dto.role !== user.role))) {
      throw new ConflictException('Admins cannot deactivate themselves or change their own role.');
    }
    if (
      dto.organisationId !== undefined &&
      !(await this.organisations.findByPk(dto.organisationId, { attributes: ['id'] }))
    ) {
      throw new NotFoundException(`No organisation ${dto.organisationId}.`);
    }
    await this.sequelize.transaction(async (transaction) => {
      const deactivating = dto.active === false && user.active;
      await user.update(dto, { transaction });
      if (deactivating) {
        // Deactivation ends every browser session at once; API tokens stop through the active flag.
        const sessionsEnded = await this.sessions.endAllForUser(id, 'deactivated', transaction);
        await this.events.record(
          { type: 'user.deactivated', actorId: actor.id, data: { userId: id, sessionsEnded } },
          transaction,
        );
      }
    });
    return this.get(id);
  }

  view(u: User): UserDto {
    return {
      id: u.id,
      email: u.email,
      name: u.name,
      role: u.role,
      organisationId: u.organisationId,
      organisation: u.organisation ? { id: u.organisation.id, name: u.organisation.name } : null,
      active: u.active,
    };
  }
}
