import { Body, Controller, Get, HttpCode, Inject, Post, Req, Res, UseGuards } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import {
  ApiBearerAuth,
  ApiCookieAuth,
  ApiForbiddenResponse,
  ApiHeader,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { ErrorBody } from '../common/error-body.js';
import { appConfig } from '../config/index.js';
import { SameOriginGuard } from '../sessions/same-origin.guard.js';
import {
  clearSessionCookie,
  readCookie,
  SESSION_COOKIE,
  setSessionCookie,
} from '../sessions/session-cookie.js';
import type { SessionGrant } from '../sessions/sessions.service.js';
import type { AuthUser } from './auth-user.js';
import { AuthService } from './auth.service.js';
import { CurrentUser } from './decorators/current-user.decorator.js';
import { Public } from './decorators/public.decorator.js';
import { TokenAccess } from './decorators/token-access.decorator.js';
import { LoginDto, LoginResponseDto, MeDto } from './dto/login.dto.js';

const SESSION_HEADER_DOC = {
  name: 'X-Ligament-Session',
  required: true,
  description: 'Must be `1`; with the Origin check, the defence against cross-site request forgery',
};

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  @Post('login')
  @Public()
  @HttpCode(200)
  @ApiOperation({
    summary:
      'Sign in with e-mail and password (failed attempts limited per account and per client address); ' +
      'also sets the httpOnly refresh cookie of a new browser session',
  })
  @ApiOkResponse({ type: LoginResponseDto })
  @ApiTooManyRequestsResponse({
    type: ErrorBody,
    description:
      'Too many failed sign-ins for the account or from the address; `Retry-After` gives the seconds',
  })
  async login(
    @Body() dto: LoginDto,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<LoginResponseDto> {
    const { body, grant } = await this.auth.login(
      dto,
      request.ip ?? request.socket.remoteAddress ?? 'unknown',
      request.headers['user-agent'],
    );
    this.setCookie(request, response, grant);
    return body;
  }

  @Post('session/refresh')
  @Public()
  @HttpCode(200)
  @UseGuards(SameOriginGuard)
  @ApiCookieAuth('session')
  @ApiHeader(SESSION_HEADER_DOC)
  @ApiOperation({
    summary:
      'A new access token for the browser session in the refresh cookie; the cookie’s token is replaced ' +
      '(a used one presented again ends the session)',
  })
  @ApiOkResponse({ type: LoginResponseDto })
  @ApiUnauthorizedResponse({
    type: ErrorBody,
    description: 'No session, or it has ended; the cookie is cleared',
  })
  @ApiForbiddenResponse({
    type: ErrorBody,
    description: 'Missing X-Ligament-Session header or a foreign Origin',
  })
  async refresh(
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<LoginResponseDto> {
    try {
      const { body, grant } = await this.auth.refresh(readCookie(request, SESSION_COOKIE));
      this.setCookie(request, response, grant);
      return body;
    } catch (error) {
      if ((error as { getStatus?: () => number }).getStatus?.() === 401)
        clearSessionCookie(request, response, this.app.publicUrl);
      throw error;
    }
  }

  @Post('session/sign-out')
  @Public()
  @HttpCode(204)
  @UseGuards(SameOriginGuard)
  @ApiCookieAuth('session')
  @ApiHeader(SESSION_HEADER_DOC)
  @ApiOperation({
    summary: 'Sign out: ends the browser session on the server (every tab) and clears the refresh cookie',
  })
  @ApiNoContentResponse({ description: 'Signed out (also when there was no session)' })
  @ApiForbiddenResponse({
    type: ErrorBody,
    description: 'Missing X-Ligament-Session header or a foreign Origin',
  })
  async signOut(@Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<void> {
    await this.auth.signOut(readCookie(request, SESSION_COOKIE));
    clearSessionCookie(request, response, this.app.publicUrl);
  }

  @Get('me')
  @ApiBearerAuth()
  @TokenAccess()
  @ApiOperation({ summary: 'The caller (a signed-in user or an API token’s owner)' })
  @ApiOkResponse({ type: MeDto })
  me(@CurrentUser() user: AuthUser): Promise<MeDto> {
    return this.auth.me(user);
  }

  /** A rotation sets the new token; a tab's race (no new token) leaves the cookie as the winner set it. */
  private setCookie(request: Request, response: Response, grant: SessionGrant): void {
    if (grant.refreshToken === null) return;
    setSessionCookie(request, response, grant.refreshToken, grant.cookieMaxAgeMs, this.app.publicUrl);
  }
}
