import { Body, Controller, Get, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { Role } from '../auth/role.enum.js';
import { CreateOrganisationDto, OrganisationDto } from './dto/organisation.dto.js';
import { OrganisationsService } from './organisations.service.js';

@ApiTags('organisations')
@ApiBearerAuth()
@Controller('organisations')
export class OrganisationsController {
  constructor(private readonly organisations: OrganisationsService) {}

  @Get()
  @ApiOperation({ summary: 'Every firm (any signed-in user: names appear on submittals and stamps)' })
  @ApiOkResponse({ type: [OrganisationDto] })
  list(): Promise<OrganisationDto[]> {
    return this.organisations.list();
  }

  @Post()
  @Roles(Role.Admin)
  @ApiOperation({ summary: 'Admin: add a firm' })
  @ApiCreatedResponse({ type: OrganisationDto })
  create(@Body() dto: CreateOrganisationDto): Promise<OrganisationDto> {
    return this.organisations.create(dto);
  }
}
