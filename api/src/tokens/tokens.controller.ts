import { Body, Controller, Delete, Get, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { Role } from '../auth/role.enum.js';
import { CreatedTokenDto, CreateTokenDto, TokenDto } from './dto/token.dto.js';
import { TokensService } from './tokens.service.js';

@ApiTags('tokens')
@ApiBearerAuth()
@Roles(Role.Consultant)
@Controller('tokens')
export class TokensController {
  constructor(private readonly tokens: TokensService) {}

  @Get()
  @ApiOperation({ summary: 'Consultant: my API tokens (never the secret)' })
  @ApiOkResponse({ type: [TokenDto] })
  list(@CurrentUser() user: AuthUser): Promise<TokenDto[]> {
    return this.tokens.list(user);
  }

  @Post()
  @ApiOperation({
    summary: 'Consultant: create a token for one of my projects; the secret is in this response only',
  })
  @ApiCreatedResponse({ type: CreatedTokenDto })
  create(@Body() dto: CreateTokenDto, @CurrentUser() user: AuthUser): Promise<CreatedTokenDto> {
    return this.tokens.create(dto, user);
  }

  @Delete(':tokenId')
  @ApiOperation({ summary: 'Consultant: revoke one of my tokens (it stops working at once)' })
  @ApiOkResponse({ type: TokenDto })
  revoke(@Param('tokenId', ParseIntPipe) tokenId: number, @CurrentUser() user: AuthUser): Promise<TokenDto> {
    return this.tokens.revoke(tokenId, user);
  }
}
