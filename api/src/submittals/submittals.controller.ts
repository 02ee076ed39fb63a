import {
  Body,
  Controller,
  Get,
  HttpCode,
  Param,
  ParseIntPipe,
  Post,
  Query,
  UploadedFiles,
  UseInterceptors,
} from '@nestjs/common';
import { FilesInterceptor } from '@nestjs/platform-express';
import {
  ApiBearerAuth,
  ApiBody,
  ApiConsumes,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiOperation,
  ApiPayloadTooLargeResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { ProjectScope } from '../auth/decorators/project-scope.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { TokenAccess } from '../auth/decorators/token-access.decorator.js';
import { Role } from '../auth/role.enum.js';
import { ErrorBody } from '../common/error-body.js';
import { PageQuery, type Page } from '../common/page.js';
import { EventPageDto } from '../events/dto/event.dto.js';
import { EventsService, type EventView } from '../events/events.service.js';
import { RecheckDto, RevisionDiffDto } from './dto/revision.dto.js';
import {
  CreateSubmittalDto,
  StampSubmittalDto,
  SubmittalDto,
  UploadResultDto,
  UploadSubmittalBodyDto,
} from './dto/submittal.dto.js';
import { RecheckService } from './recheck.service.js';
import { RevisionsService } from './revisions.service.js';
import { SubmittalsService } from './submittals.service.js';

@ApiTags('submittals')
@ApiBearerAuth()
@Controller()
export class SubmittalsController {
  constructor(
    private readonly submittals: SubmittalsService,
    private readonly revisions: RevisionsService,
    private readonly rechecks: RecheckService,
    private readonly events: EventsService,
  ) {}

  @Get('projects/:projectId/submittals')
  @TokenAccess()
  @ProjectScope('project', 'projectId')
  @ApiOperation({ summary: "The project's submittals, newest first" })
  @ApiOkResponse({ type: [SubmittalDto] })
  list(@Param('projectId', ParseIntPipe) projectId: number): Promise<SubmittalDto[]> {
    return this.submittals.list(projectId);
  }

  @Post('projects/:projectId/submittals')
  @Roles(Role.Consultant, Role.Checker)
  @TokenAccess()
  @ProjectScope('project', 'projectId')
  @UseInterceptors(FilesInterceptor('files'))
  @ApiConsumes('multipart/form-data')
  @ApiBody({ type: UploadSubmittalBodyDto })
  @ApiOperation({
    summary:
      'Upload a submittal: every file validated, every member recomputed, all stored in one transaction',
    description:
      'Any invalid file answers 422 with every CalcError of every file in `details`, and nothing is stored.',
  })
  @ApiCreatedResponse({ type: UploadResultDto })
  @ApiUnprocessableEntityResponse({
    type: ErrorBody,
    description: 'details: CalcError[] {file, pointer, line, column, rule, message}',
  })
  @ApiPayloadTooLargeResponse({
    type: ErrorBody,
    description: 'A file or the total is over the configured limit',
  })
  upload(
    @Param('projectId', ParseIntPipe) projectId: number,
    @Body() dto: CreateSubmittalDto,
    @UploadedFiles() files: Express.Multer.File[] | undefined,
    @CurrentUser() user: AuthUser,
  ): Promise<UploadResultDto> {
    const incoming = (files ?? []).map((f) => ({ name: f.originalname, content: f.buffer }));
    return this.submittals.upload(projectId, dto, incoming, user);
  }

  @Get('submittals/:submittalId')
  @TokenAccess()
  @ProjectScope('submittal', 'submittalId')
  @ApiOperation({ summary: 'One submittal with its summary, stamp and revision links' })
  @ApiOkResponse({ type: SubmittalDto })
  get(@Param('submittalId', ParseIntPipe) submittalId: number): Promise<SubmittalDto> {
    return this.submittals.get(submittalId);
  }

  @Get('submittals/:submittalId/diff')
  @TokenAccess()
  @ProjectScope('submittal', 'submittalId')
  @ApiOperation({
    summary:
      'A revision against the submittal it revises: file diffs; discrepancies closed, kept, opened (409 if not a revision)',
  })
  @ApiOkResponse({ type: RevisionDiffDto })
  diff(@Param('submittalId', ParseIntPipe) submittalId: number): Promise<RevisionDiffDto> {
    return this.revisions.diff(submittalId);
  }

  @Post('submittals/:submittalId/recheck')
  @HttpCode(200)
  @Roles(Role.Checker)
  @ProjectScope('submittal', 'submittalId')
  @ApiOperation({
    summary: 'Checker: re-run the stored files with the current engine and report what changed',
  })
  @ApiOkResponse({ type: RecheckDto })
  recheck(
    @Param('submittalId', ParseIntPipe) submittalId: number,
    @CurrentUser() user: AuthUser,
  ): Promise<RecheckDto> {
    return this.rechecks.recheck(submittalId, user);
  }

  @Post('submittals/:submittalId/stamp')
  @HttpCode(200)
  @Roles(Role.Checker)
  @ProjectScope('submittal', 'submittalId')
  @ApiOperation({
    summary:
      'Checker: stamp with a review action (409 while error-severity discrepancies are open, unless overrideReason)',
  })
  @ApiOkResponse({ type: SubmittalDto })
  stamp(
    @Param('submittalId', ParseIntPipe) submittalId: number,
    @Body() dto: StampSubmittalDto,
    @CurrentUser() user: AuthUser,
  ): Promise<SubmittalDto> {
    return this.submittals.stamp(submittalId, dto, user);
  }

  @Get('submittals/:submittalId/events')
  @TokenAccess()
  @ProjectScope('submittal', 'submittalId')
  @ApiOperation({ summary: "The submittal's events, oldest first" })
  @ApiOkResponse({ type: EventPageDto })
  listEvents(
    @Param('submittalId', ParseIntPipe) submittalId: number,
    @Query() query: PageQuery,
  ): Promise<Page<EventView>> {
    return this.events.list({ submittalId }, query.page, query.pageSize);
  }
}
