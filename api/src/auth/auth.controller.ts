import { Body, Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from './auth-user.js';
import { AuthService } from './auth.service.js';
import { CurrentUser } from './decorators/current-user.decorator.js';
import { LoginThrottle } from './decorators/login-throttle.decorator.js';
import { Public } from './decorators/public.decorator.js';
import { TokenAccess } from './decorators/token-access.decorator.js';
import { LoginDto, LoginResponseDto, MeDto } from './dto/login.dto.js';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Post('login')
  @Public()
  @LoginThrottle()
  @HttpCode(200)
  @ApiOperation({ summary: 'Sign in with e-mail and password (throttled per client address)' })
  @ApiOkResponse({ type: LoginResponseDto })
  login(@Body() dto: LoginDto): Promise<LoginResponseDto> {
    return this.auth.login(dto);
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
