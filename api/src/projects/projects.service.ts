import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { AuthUser } from '../auth/auth-user.js';
import { ProjectAccessService } from '../auth/project-access.service.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { OPEN_STATUSES } from '../discrepancies/discrepancy-status.js';
import { EventsService } from '../events/events.service.js';
import { Organisation } from '../organisations/models/organisation.model.js';
import { Submittal } from '../submittals/models/submittal.model.js';
import { TokensService } from '../tokens/tokens.service.js';
import { User } from '../users/models/user.model.js';
import { UsersService } from '../users/users.service.js';
import type { CreateProjectDto, ProjectDto, ProjectMemberDto, UpdateProjectDto } from './dto/project.dto.js';
import { ProjectMember } from './models/project-member.model.js';
import { Project } from './models/project.model.js';

@Injectable()
export class ProjectsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Project) private readonly projects: typeof Project,
    @InjectModel(ProjectMember) private readonly members: typeof ProjectMember,
    @InjectModel(Submittal) private readonly submittals: typeof Submittal,
    @InjectModel(Discrepancy) private readonly discrepancies: typeof Discrepancy,
    @InjectModel(User) private readonly userModel: typeof User,
    @InjectModel(Organisation) private readonly organisations: typeof Organisation,
    private readonly access: ProjectAccessService,
    private readonly users: UsersService,
    private readonly events: EventsService,
    private readonly tokens: TokensService,
  ) {}

  async list(user: AuthUser): Promise<ProjectDto[]> {
    const ids = await this.access.visibleProjectIds(user);
    const rows = await this.projects.findAll({
      where: { id: { [Op.in]: ids } },
      include: [Organisation],
      order: [['id', 'ASC']],
    });
    return Promise.all(rows.map((p) => this.view(p)));
  }

  async get(id: number): Promise<ProjectDto> {
    const project = await this.projects.findByPk(id, { include: [Organisation] });
    if (!project) throw new NotFoundException(`No project ${id}.`);
    return this.view(project);
  }

  async create(dto: CreateProjectDto, actor: AuthUser): Promise<ProjectDto> {
    await this.checkOwner(dto.ownerOrganisationId);
    const project = await this.projects.create({ ...dto });
    await this.events.record({
      type: 'project.created',
      actorId: actor.id,
      projectId: project.id,
      data: { name: project.name },
    });
    return this.get(project.id);
  }

  async update(id: number, dto: UpdateProjectDto, actor: AuthUser): Promise<ProjectDto> {
    const project = await this.projects.findByPk(id);
    if (!project) throw new NotFoundException(`No project ${id}.`);
    await this.checkOwner(dto.ownerOrganisationId);
    await project.update(dto);
    await this.events.record({ type: 'project.updated', actorId: actor.id, projectId: id, data: { ...dto } });
    return this.get(id);
  }

  async listMembers(projectId: number): Promise<ProjectMemberDto[]> {
    const rows = await this.members.findAll({
      where: { projectId },
      include: [{ model: User, include: [Organisation] }],
      order: [['id', 'ASC']],
    });
    return rows.flatMap((m) =>
      m.user ? [{ ...this.users.view(m.user), memberSince: new Date(m.createdAt).toISOString() }] : [],
    );
  }

  async addMember(projectId: number, userId: number, actor: AuthUser): Promise<ProjectMemberDto[]> {
    if (!(await this.projects.findByPk(projectId))) throw new NotFoundException(`No project ${projectId}.`);
    if (!(await this.userModel.findByPk(userId))) throw new NotFoundException(`No user ${userId}.`);
    if (await this.access.isMember(projectId, userId))
      throw new ConflictException(`User ${userId} is already a member.`);
    await this.members.create({ projectId, userId });
    await this.events.record({
      type: 'project.member-added',
      actorId: actor.id,
      projectId,
      data: { userId },
    });
    return this.listMembers(projectId);
  }

  /** Removes the membership and revokes the user's API tokens for the project, in one transaction. */
  async removeMember(projectId: number, userId: number, actor: AuthUser): Promise<ProjectMemberDto[]> {
    await this.sequelize.transaction(async (transaction) => {
      const removed = await this.members.destroy({ where: { projectId, userId }, transaction });
      if (!removed) throw new NotFoundException(`User ${userId} is not a member of project ${projectId}.`);
      const revokedTokenIds = await this.tokens.revokeForMembership(projectId, userId, actor, transaction);
      await this.events.record(
        { type: 'project.member-removed', actorId: actor.id, projectId, data: { userId, revokedTokenIds } },
        transaction,
      );
    });
    return this.listMembers(projectId);
  }

  private async checkOwner(id: number | undefined): Promise<void> {
    if (id !== undefined && !(await this.organisations.findByPk(id)))
      throw new NotFoundException(`No organisation ${id}.`);
  }

  private async view(p: Project): Promise<ProjectDto> {
    const [submittalCount, openDiscrepancyCount] = await Promise.all([
      this.submittals.count({ where: { projectId: p.id } }),
      // Current items only: one a later revision carried on or resolved is not open any more here.
      this.discrepancies.count({
        where: { projectId: p.id, status: { [Op.in]: [...OPEN_STATUSES] }, supersededBySubmittalId: null },
      }),
    ]);
    return {
      id: p.id,
      name: p.name,
      reference: p.reference,
      description: p.description,
      ownerOrganisation: p.ownerOrganisation
        ? { id: p.ownerOrganisation.id, name: p.ownerOrganisation.name }
        : null,
      submittalCount,
      openDiscrepancyCount,
      createdAt: new Date(p.createdAt).toISOString(),
    };
  }
}
