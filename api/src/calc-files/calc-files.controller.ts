import { Controller, Get, Param, ParseIntPipe, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiProduces, ApiTags } from '@nestjs/swagger';
import { ProjectScope } from '../auth/decorators/project-scope.decorator.js';
import { TokenAccess } from '../auth/decorators/token-access.decorator.js';
import { attachmentDisposition } from '../common/content-disposition.js';
import { CalcFilesService } from './calc-files.service.js';
import { CalcFileDetailDto, CalcFileDto } from './dto/calc-file.dto.js';

@ApiTags('calc-files')
@ApiBearerAuth()
@TokenAccess()
@Controller()
export class CalcFilesController {
  constructor(private readonly files: CalcFilesService) {}

  @Get('submittals/:submittalId/files')
  @ProjectScope('submittal', 'submittalId')
  @ApiOperation({ summary: 'The calc files of a submittal (without contents)' })
  @ApiOkResponse({ type: [CalcFileDto] })
  list(@Param('submittalId', ParseIntPipe) submittalId: number): Promise<CalcFileDto[]> {
    return this.files.list(submittalId);
  }

  @Get('calc-files/:fileId')
  @ProjectScope('calc-file', 'fileId')
  @ApiOperation({ summary: 'One calc file with its normalised document' })
  @ApiOkResponse({ type: CalcFileDetailDto })
  get(@Param('fileId', ParseIntPipe) fileId: number): Promise<CalcFileDetailDto> {
    return this.files.get(fileId);
  }

  @Get('calc-files/:fileId/content')
  @ProjectScope('calc-file', 'fileId')
  @ApiProduces('application/json')
  @ApiOperation({ summary: 'The original bytes as uploaded (sha256 in the ETag)' })
  async content(@Param('fileId', ParseIntPipe) fileId: number): Promise<StreamableFile> {
    const file = await this.files.content(fileId);
    return new StreamableFile(file.content, {
      type: 'application/json',
      disposition: attachmentDisposition(file.fileName),
      length: file.content.length,
    });
  }
}
