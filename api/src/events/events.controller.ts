import { Controller, Get, Param, ParseIntPipe, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ProjectScope } from '../auth/decorators/project-scope.decorator.js';
import { TokenAccess } from '../auth/decorators/token-access.decorator.js';
import { PageQuery, type Page } from '../common/page.js';
import { EventsService, type EventView } from './events.service.js';
import { EventPageDto } from './dto/event.dto.js';

@ApiTags('events')
@ApiBearerAuth()
@Controller()
export class EventsController {
  constructor(private readonly events: EventsService) {}

  @Get('projects/:projectId/events')
  @TokenAccess()
  @ProjectScope('project', 'projectId')
  @ApiOperation({ summary: "The project's event log, oldest first" })
  @ApiOkResponse({ type: EventPageDto })
  list(
    @Param('projectId', ParseIntPipe) projectId: number,
    @Query() query: PageQuery,
  ): Promise<Page<EventView>> {
    return this.events.list({ projectId }, query.page, query.pageSize);
  }
}
