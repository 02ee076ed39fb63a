import { Controller, Get, Param, ParseIntPipe } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ProjectScope } from '../auth/decorators/project-scope.decorator.js';
import { TokenAccess } from '../auth/decorators/token-access.decorator.js';
import { MemberResultDto } from './dto/member-result.dto.js';
import { ResultsService } from './results.service.js';

@ApiTags('results')
@ApiBearerAuth()
@Controller()
export class ResultsController {
  constructor(private readonly results: ResultsService) {}

  @Get('submittals/:submittalId/results')
  @TokenAccess()
  @ProjectScope('submittal', 'submittalId')
  @ApiOperation({
    summary:
      'Recomputed member results: engine version, profile, inputs hash, per-direction least chains, An, Ae, strengths',
  })
  @ApiOkResponse({ type: [MemberResultDto] })
  list(@Param('submittalId', ParseIntPipe) submittalId: number): Promise<MemberResultDto[]> {
    return this.results.list(submittalId);
  }
}
