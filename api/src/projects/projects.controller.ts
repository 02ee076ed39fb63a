import { Body, Controller, Delete, Get, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { ProjectScope } from '../auth/decorators/project-scope.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { TokenAccess } from '../auth/decorators/token-access.decorator.js';
import { Role } from '../auth/role.enum.js';
import {
  AddMemberDto,
  CreateProjectDto,
  ProjectDto,
  ProjectMemberDto,
  UpdateProjectDto,
} from './dto/project.dto.js';
import { ProjectsService } from './projects.service.js';

@ApiTags('projects')
@ApiBearerAuth()
@Controller('projects')
export class ProjectsController {
  constructor(private readonly projects: ProjectsService) {}

  @Get()
  @TokenAccess()
  @ApiOperation({ summary: 'Projects I am a member of (admin: all; API token: its project)' })
  @ApiOkResponse({ type: [ProjectDto] })
  list(@CurrentUser() user: AuthUser): Promise<ProjectDto[]> {
    return this.projects.list(user);
  }

  @Post()
  @Roles(Role.Admin)
  @ApiOperation({ summary: 'Admin: create a project' })
  @ApiCreatedResponse({ type: ProjectDto })
  create(@Body() dto: CreateProjectDto, @CurrentUser() user: AuthUser): Promise<ProjectDto> {
    return this.projects.create(dto, user);
  }

  @Get(':projectId')
  @TokenAccess()
  @ProjectScope('project', 'projectId')
  @ApiOperation({ summary: 'One project (members, admin, its API tokens)' })
  @ApiOkResponse({ type: ProjectDto })
  get(@Param('projectId', ParseIntPipe) projectId: number): Promise<ProjectDto> {
    return this.projects.get(projectId);
  }

  @Patch(':projectId')
  @Roles(Role.Admin)
  @ProjectScope('project', 'projectId')
  @ApiOperation({ summary: 'Admin: rename or re-describe a project' })
  @ApiOkResponse({ type: ProjectDto })
  update(
    @Param('projectId', ParseIntPipe) projectId: number,
    @Body() dto: UpdateProjectDto,
    @CurrentUser() user: AuthUser,
  ): Promise<ProjectDto> {
    return this.projects.update(projectId, dto, user);
  }

  @Get(':projectId/members')
  @TokenAccess()
  @ProjectScope('project', 'projectId')
  @ApiOperation({ summary: 'Who is on the project' })
  @ApiOkResponse({ type: [ProjectMemberDto] })
  members(@Param('projectId', ParseIntPipe) projectId: number): Promise<ProjectMemberDto[]> {
    return this.projects.listMembers(projectId);
  }

  @Post(':projectId/members')
  @Roles(Role.Admin)
  @ProjectScope('project', 'projectId')
  @ApiOperation({ summary: 'Admin: add a member; answers the new member list' })
  @ApiCreatedResponse({ type: [ProjectMemberDto] })
  addMember(
    @Param('projectId', ParseIntPipe) projectId: number,
    @Body() dto: AddMemberDto,
    @CurrentUser() user: AuthUser,
  ): Promise<ProjectMemberDto[]> {
    return this.projects.addMember(projectId, dto.userId, user);
  }

  @Delete(':projectId/members/:userId')
  @Roles(Role.Admin)
  @ProjectScope('project', 'projectId')
  @ApiOperation({ summary: 'Admin: remove a member; answers the new member list' })
  @ApiOkResponse({ type: [ProjectMemberDto] })
  removeMember(
    @Param('projectId', ParseIntPipe) projectId: number,
    @Param('userId', ParseIntPipe) userId: number,
    @CurrentUser() user: AuthUser,
  ): Promise<ProjectMemberDto[]> {
    return this.projects.removeMember(projectId, userId, user);
  }
}
