import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Post, Query, Res } from '@nestjs/common';
import type { Response } from 'express';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { ProjectScope } from '../auth/decorators/project-scope.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { TokenAccess } from '../auth/decorators/token-access.decorator.js';
import { Role } from '../auth/role.enum.js';
import { DiscrepanciesService } from './discrepancies.service.js';
import {
  BulkResultDto,
  BulkTransitionDto,
  CommentViewDto,
  CreateCommentDto,
  DiscrepancyDetailDto,
  DiscrepancyPageDto,
  ListDiscrepanciesQuery,
  TransitionDto,
} from './dto/discrepancy.dto.js';

@ApiTags('discrepancies')
@ApiBearerAuth()
@Controller()
export class DiscrepanciesController {
  constructor(private readonly discrepancies: DiscrepanciesService) {}

  @Get('projects/:projectId/discrepancies')
  @TokenAccess()
  @ProjectScope('project', 'projectId')
  @ApiOperation({
    summary:
      'Discrepancies of a project: filters (submittal, class, severity, status, member, code), sort, pages',
  })
  @ApiOkResponse({ type: DiscrepancyPageDto })
  async list(
    @Param('projectId', ParseIntPipe) projectId: number,
    @Query() query: ListDiscrepanciesQuery,
    @Res() res: Response,
  ): Promise<void> {
    // The page arrives as JSON bytes built by SQLite (see DiscrepanciesService.list) and is sent as is.
    res.type('application/json').send(await this.discrepancies.list(projectId, query));
  }

  @Post('projects/:projectId/discrepancies/bulk-transition')
  @HttpCode(200)
  @Roles(Role.Checker)
  @ProjectScope('project', 'projectId')
  @ApiOperation({
    summary: 'Checker: move many discrepancies at once (accepted, returned, waived); all or nothing',
  })
  @ApiOkResponse({ type: BulkResultDto })
  bulk(
    @Param('projectId', ParseIntPipe) projectId: number,
    @Body() dto: BulkTransitionDto,
    @CurrentUser() user: AuthUser,
  ): Promise<BulkResultDto> {
    return this.discrepancies.bulkMove(projectId, dto, user);
  }

  @Get('discrepancies/:discrepancyId')
  @TokenAccess()
  @ProjectScope('discrepancy', 'discrepancyId')
  @ApiOperation({ summary: 'One discrepancy with its history, comments and the moves open to the caller' })
  @ApiOkResponse({ type: DiscrepancyDetailDto })
  get(
    @Param('discrepancyId', ParseIntPipe) id: number,
    @CurrentUser() user: AuthUser,
  ): Promise<DiscrepancyDetailDto> {
    return this.discrepancies.detail(id, user);
  }

  @Post('discrepancies/:discrepancyId/transitions')
  @HttpCode(200)
  @Roles(Role.Consultant, Role.Checker)
  @ProjectScope('discrepancy', 'discrepancyId')
  @ApiOperation({
    summary: 'Move a discrepancy: answered (consultant), accepted / returned / waived (checker)',
    description:
      '403 wrong role for that move, 409 not allowed from the current status, 400 missing note or reason.',
  })
  @ApiOkResponse({ type: DiscrepancyDetailDto })
  move(
    @Param('discrepancyId', ParseIntPipe) id: number,
    @Body() dto: TransitionDto,
    @CurrentUser() user: AuthUser,
  ): Promise<DiscrepancyDetailDto> {
    return this.discrepancies.move(id, dto, user);
  }

  @Post('discrepancies/:discrepancyId/comments')
  @Roles(Role.Consultant, Role.Checker)
  @ProjectScope('discrepancy', 'discrepancyId')
  @ApiOperation({ summary: 'Consultant or checker: comment on a discrepancy' })
  @ApiCreatedResponse({ type: CommentViewDto })
  comment(
    @Param('discrepancyId', ParseIntPipe) id: number,
    @Body() dto: CreateCommentDto,
    @CurrentUser() user: AuthUser,
  ): Promise<CommentViewDto> {
    return this.discrepancies.comment(id, dto, user);
  }

  @Post('discrepancies/:discrepancyId/acknowledge')
  @HttpCode(200)
  @Roles(Role.OwnerRep)
  @ProjectScope('discrepancy', 'discrepancyId')
  @ApiOperation({ summary: "Owner's rep: acknowledge a discrepancy (their only change; idempotent)" })
  @ApiOkResponse({ type: DiscrepancyDetailDto })
  acknowledge(
    @Param('discrepancyId', ParseIntPipe) id: number,
    @CurrentUser() user: AuthUser,
  ): Promise<DiscrepancyDetailDto> {
    return this.discrepancies.acknowledge(id, user);
  }
}
