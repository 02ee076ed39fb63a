import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { CalcFile } from '../calc-files/models/calc-file.model.js';
import { HotReadsService } from '../database/hot-reads.service.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { Project } from '../projects/models/project.model.js';
import { Submittal } from '../submittals/models/submittal.model.js';
import type { ScopeKind } from './decorators/project-scope.decorator.js';
import type { AuthUser } from './auth-user.js';
import { Role } from './role.enum.js';

/** Answers "which project is this in" and "is this user a member" for the guards and services. */
@Injectable()
export class ProjectAccessService {
  constructor(
    @InjectModel(Project) private readonly projects: typeof Project,
    @InjectModel(ProjectMember) private readonly members: typeof ProjectMember,
    @InjectModel(Submittal) private readonly submittals: typeof Submittal,
    @InjectModel(Discrepancy) private readonly discrepancies: typeof Discrepancy,
    @InjectModel(CalcFile) private readonly calcFiles: typeof CalcFile,
    private readonly reads: HotReadsService,
  ) {}

  async projectOf(kind: ScopeKind, id: number): Promise<number | null> {
    switch (kind) {
      case 'project':
        return (await this.projects.findByPk(id, { attributes: ['id'] }))?.id ?? null;
      case 'submittal':
        return (await this.submittals.findByPk(id, { attributes: ['projectId'] }))?.projectId ?? null;
      case 'discrepancy':
        return (await this.discrepancies.findByPk(id, { attributes: ['projectId'] }))?.projectId ?? null;
      case 'calc-file': {
        const file = await this.calcFiles.findByPk(id, { attributes: ['submittalId'] });
        return file ? this.projectOf('submittal', file.submittalId) : null;
      }
    }
  }

  /**
   * The project behind a project id and the caller's membership, in one query (the guard runs on
   * every project-scoped request). null when the project does not exist.
   */
  async projectMembership(projectId: number, userId: number): Promise<{ member: boolean } | null> {
    const row = await this.reads.get<{ member: number }>(
      'SELECT EXISTS (SELECT 1 FROM project_members WHERE projectId = ?1 AND userId = ?2) AS member FROM projects WHERE id = ?1',
      [projectId, userId],
    );
    return row ? { member: row.member === 1 } : null;
  }

  async isMember(projectId: number, userId: number): Promise<boolean> {
    return (await this.members.count({ where: { projectId, userId } })) > 0;
  }

  /** Projects the caller can see: all for an admin, the token's one for a token, else memberships. */
  async visibleProjectIds(user: AuthUser): Promise<number[]> {
    if (user.token) return [user.token.projectId];
    if (user.role === Role.Admin)
      return (await this.projects.findAll({ attributes: ['id'] })).map((p) => p.id);
    return (await this.members.findAll({ where: { userId: user.id }, attributes: ['projectId'] })).map(
      (m) => m.projectId,
    );
  }
}
