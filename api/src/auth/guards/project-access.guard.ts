import {
  CanActivate,
  ExecutionContext,
  ForbiddenException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ProjectAccessService } from '../project-access.service.js';
import type { AuthUser } from '../auth-user.js';
import { PROJECT_SCOPE, type ProjectScopeOptions } from '../decorators/project-scope.decorator.js';
import { Role } from '../role.enum.js';

/**
 * Membership guard for routes marked @ProjectScope(kind, param): resolves the project behind the
 * parameter (404 when the id does not exist) and admits members, admins, and API tokens of that very
 * project. The resolved project id is left on `request.projectId`.
 */
@Injectable()
export class ProjectAccessGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly access: ProjectAccessService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const scope = this.reflector.get<ProjectScopeOptions | undefined>(PROJECT_SCOPE, context.getHandler());
    if (!scope) return true;
    const request = context
      .switchToHttp()
      .getRequest<{ user: AuthUser; params: Record<string, string>; projectId?: number }>();
    const raw = request.params[scope.param];
    const id = Number(raw);
    if (!Number.isSafeInteger(id) || id < 1) throw new NotFoundException(`No ${scope.kind} ${raw ?? ''}.`);
    const user = request.user;
    let projectId: number | null;
    let member: boolean;
    if (scope.kind === 'project') {
      // The common case, in one query: does the project exist, and is the caller on it.
      const found = await this.access.projectMembership(id, user.id);
      projectId = found ? id : null;
      member = found?.member ?? false;
    } else {
      projectId = await this.access.projectOf(scope.kind, id);
      member = projectId !== null && (await this.access.isMember(projectId, user.id));
    }
    if (projectId === null) throw new NotFoundException(`No ${scope.kind} ${id}.`);
    if (user.token) {
      if (user.token.projectId !== projectId)
        throw new ForbiddenException('This API token belongs to another project.');
    } else if (user.role !== Role.Admin && !member) {
      throw new ForbiddenException('You are not a member of this project.');
    }
    request.projectId = projectId;
    return true;
  }
}
