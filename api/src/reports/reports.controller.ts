import { Controller, Get, Header, Param, ParseIntPipe, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { ProjectScope } from '../auth/decorators/project-scope.decorator.js';
import { TokenAccess } from '../auth/decorators/token-access.decorator.js';
import { DashboardService } from './dashboard.service.js';
import { DashboardDto, DashboardQuery } from './dto/dashboard.dto.js';
import { ReviewReportService } from './review-report.service.js';

@ApiTags('reports')
@ApiBearerAuth()
@Controller()
export class ReportsController {
  constructor(
    private readonly dashboards: DashboardService,
    private readonly reports: ReviewReportService,
  ) {}

  @Get('dashboard')
  @ApiOperation({
    summary:
      "Owner's-rep dashboard (any role, over the caller's projects): open findings by class, severity, age; trend by submittal",
  })
  @ApiOkResponse({ type: DashboardDto })
  dashboard(@CurrentUser() user: AuthUser, @Query() query: DashboardQuery): Promise<DashboardDto> {
    return this.dashboards.dashboard(user, query.projectId);
  }

  @Get('dashboard/open-discrepancies.csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="open-discrepancies.csv"')
  @ApiProduces('text/csv')
  @ApiOperation({ summary: "Every open discrepancy of the caller's projects, as CSV" })
  @ApiOkResponse({ schema: { type: 'string' } })
  csv(@CurrentUser() user: AuthUser, @Query() query: DashboardQuery): Promise<string> {
    return this.dashboards.openCsv(user, query.projectId);
  }

  @Get('submittals/:submittalId/report')
  @TokenAccess()
  @ProjectScope('submittal', 'submittalId')
  @Header('Content-Type', 'text/html; charset=utf-8')
  @ApiProduces('text/html')
  @ApiOperation({
    summary: 'Printable review report (HTML): members, governing chains, findings, stamp, caution',
  })
  @ApiOkResponse({ schema: { type: 'string' } })
  report(@Param('submittalId', ParseIntPipe) submittalId: number): Promise<string> {
    return this.reports.html(submittalId);
  }
}
