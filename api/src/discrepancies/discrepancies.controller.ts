import {
  Body,
  Controller,
  Get,
  HttpCode,
  Param,
  ParseIntPipe,
  Patch,
  Post,
  Query,
  Res,
} from '@nestjs/common';
import type { Response } from 'express';
import {
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProduces,
  ApiTags,
} from '@nestjs/swagger';
import { attachmentDisposition } from '../common/content-disposition.js';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { ProjectScope } from '../auth/decorators/project-scope.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { TokenAccess } from '../auth/decorators/token-access.decorator.js';
import { Role } from '../auth/role.enum.js';
import { DiscrepanciesService } from './discrepancies.service.js';
import {
  AssignDto,
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

  @Get('projects/:projectId/discrepancies.csv')
  @TokenAccess()
  @ProjectScope('project', 'projectId')
  @ApiProduces('text/csv')
  @ApiOperation({
    summary:
      'The discrepancies the list filters match, every page, as CSV (UTF-8 with BOM; quantity, unit and unit-system columns)',
  })
  @ApiOkResponse({ schema: { type: 'string' } })
  async csv(
    @Param('projectId', ParseIntPipe) projectId: number,
    @Query() query: ListDiscrepanciesQuery,
    @Res() res: Response,
  ): Promise<void> {
    const name = `discrepancies-project-${projectId}${query.submittalId ? `-submittal-${query.submittalId}` : ''}.csv`;
    res
      .type('text/csv; charset=utf-8')
      .setHeader('Content-Disposition', attachmentDisposition(name))
      .send(await this.discrepancies.csv(projectId, query));
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
    summary:
      'Move a discrepancy: answered (consultant), accepted / returned / waived (checker); returned from accepted or waived reopens it (checker)',
    description:
      '403 wrong role for that move, 409 not allowed from the current status, superseded, or changed by someone else meanwhile (details: the current status), 400 missing note or reason.',
  })
  @ApiOkResponse({ type: DiscrepancyDetailDto })
  move(
    @Param('discrepancyId', ParseIntPipe) id: number,
    @Body() dto: TransitionDto,
    @CurrentUser() user: AuthUser,
  ): Promise<DiscrepancyDetailDto> {
    return this.discrepancies.move(id, dto, user);
  }

  @Patch('discrepancies/:discrepancyId/assignment')
  @Roles(Role.Checker)
  @ProjectScope('discrepancy', 'discrepancyId')
  @ApiOperation({
    summary: 'Checker: set or clear the assignee (a consultant or checker of the project) and the due date',
    description:
      '409 when someone else changed the item meanwhile or it is superseded; 422 for an assignee who cannot work on it.',
  })
  @ApiOkResponse({ type: DiscrepancyDetailDto })
  assign(
    @Param('discrepancyId', ParseIntPipe) id: number,
    @Body() dto: AssignDto,
    @CurrentUser() user: AuthUser,
  ): Promise<DiscrepancyDetailDto> {
    return this.discrepancies.assign(id, dto, user);
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
