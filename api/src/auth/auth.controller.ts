import { Body, Controller, Get, HttpCode, Post, Req } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiTooManyRequestsResponse,
} from '@nestjs/swagger';
import type { Request } from 'express';
import { ErrorBody } from '../common/error-body.js';
import type { AuthUser } from './auth-user.js';
import { AuthService } from './auth.service.js';
import { CurrentUser } from './decorators/current-user.decorator.js';
import { Public } from './decorators/public.decorator.js';
import { TokenAccess } from './decorators/token-access.decorator.js';
import { LoginDto, LoginResponseDto, MeDto } from './dto/login.dto.js';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Post('login')
  @Public()
  @HttpCode(200)
  @ApiOperation({
    summary: 'Sign in with e-mail and password (failed attempts limited per account and per client address)',
  })
  @ApiOkResponse({ type: LoginResponseDto })
  @ApiTooManyRequestsResponse({
    type: ErrorBody,
    description:
      'Too many failed sign-ins for the account or from the address; `Retry-After` gives the seconds',
  })
  login(@Body() dto: LoginDto, @Req() request: Request): Promise<LoginResponseDto> {
    return this.auth.login(dto, request.ip ?? request.socket.remoteAddress ?? 'unknown');
  }

  @Get('me')
  @ApiBearerAuth()
  @TokenAccess()
  @ApiOperation({ summary: 'The caller (a signed-in user or an API token’s owner)' })
  @ApiOkResponse({ type: MeDto })
  me(@CurrentUser() user: AuthUser): Promise<MeDto> {
    return this.auth.me(user);
  }
}
