import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Post } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProperty,
  ApiTags,
} from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Public } from '../auth/decorators/public.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { Role } from '../auth/role.enum.js';
import {
  AcceptInvitationDto,
  CreateInvitationDto,
  InvitationDto,
  InvitationPreviewDto,
} from './dto/user.dto.js';
import { InvitationsService } from './invitations.service.js';

class AcceptedDto {
  @ApiProperty() id: number;
  @ApiProperty() email: string;
}

@ApiTags('invitations')
@Controller('invitations')
export class InvitationsController {
  constructor(private readonly invitations: InvitationsService) {}

  @Get()
  @ApiBearerAuth()
  @Roles(Role.Admin)
  @ApiOperation({ summary: 'Admin: every invitation, newest first' })
  @ApiOkResponse({ type: [InvitationDto] })
  list(): Promise<InvitationDto[]> {
    return this.invitations.list();
  }

  @Post()
  @ApiBearerAuth()
  @Roles(Role.Admin)
  @ApiOperation({
    summary: 'Admin: invite someone by e-mail (the one-time link goes out through the outbox)',
  })
  @ApiCreatedResponse({ type: InvitationDto })
  async create(@Body() dto: CreateInvitationDto, @CurrentUser() actor: AuthUser): Promise<InvitationDto> {
    return (await this.invitations.create(dto, actor)).invitation;
  }

  @Post(':invitationId/resend')
  @ApiBearerAuth()
  @Roles(Role.Admin)
  @ApiOperation({
    summary:
      'Admin: send a waiting or expired invitation again with a new link; the old link stops working ' +
      '(409 when accepted, revoked or already replaced)',
  })
  @ApiCreatedResponse({ type: InvitationDto, description: 'The new invitation that replaces it' })
  async resend(
    @Param('invitationId', ParseIntPipe) invitationId: number,
    @CurrentUser() actor: AuthUser,
  ): Promise<InvitationDto> {
    return (await this.invitations.resend(invitationId, actor)).invitation;
  }

  @Post(':invitationId/revoke')
  @HttpCode(200)
  @ApiBearerAuth()
  @Roles(Role.Admin)
  @ApiOperation({
    summary: 'Admin: withdraw an invitation; its link stops working (409 when accepted or already replaced)',
  })
  @ApiOkResponse({ type: InvitationDto })
  revoke(
    @Param('invitationId', ParseIntPipe) invitationId: number,
    @CurrentUser() actor: AuthUser,
  ): Promise<InvitationDto> {
    return this.invitations.revoke(invitationId, actor);
  }

  @Get(':token')
  @Public()
  @ApiOperation({
    summary:
      'Public: what an invitation link is for (404 unknown; 410 used, revoked, replaced or expired, with details [{ state }])',
  })
  @ApiOkResponse({ type: InvitationPreviewDto })
  preview(@Param('token') token: string): Promise<InvitationPreviewDto> {
    return this.invitations.preview(token);
  }

  @Post(':token/accept')
  @Public()
  @ApiOperation({ summary: 'Public: set a password with the one-time link; the account is then active' })
  @ApiCreatedResponse({ type: AcceptedDto })
  accept(@Param('token') token: string, @Body() dto: AcceptInvitationDto): Promise<AcceptedDto> {
    return this.invitations.accept(token, dto);
  }
}
