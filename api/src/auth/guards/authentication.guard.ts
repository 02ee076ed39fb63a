import { ExecutionContext, ForbiddenException, Injectable, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import type { Request } from 'express';
import { TokensService, API_TOKEN_PREFIX } from '../../tokens/tokens.service.js';
import type { AuthUser } from '../auth-user.js';
import { IS_PUBLIC } from '../decorators/public.decorator.js';
import { TOKEN_ACCESS } from '../decorators/token-access.decorator.js';

/**
 * Global guard: every route needs a caller unless marked @Public(). A bearer token that starts with
 * the API-token prefix is looked up as a personal API token (and only admitted on @TokenAccess()
 * routes); anything else goes to passport-jwt.
 */
@Injectable()
export class AuthenticationGuard extends AuthGuard('jwt') {
  constructor(
    private readonly reflector: Reflector,
    private readonly tokens: TokensService,
  ) {
    super();
  }

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;
    const request = context.switchToHttp().getRequest<Request & { user?: AuthUser }>();
    const header = request.headers.authorization ?? '';
    const bearer = header.startsWith('Bearer ') ? header.slice(7).trim() : '';
    if (bearer.startsWith(API_TOKEN_PREFIX)) {
      const user = await this.tokens.authenticate(bearer);
      if (!user) throw new UnauthorizedException('The API token is unknown or has been revoked.');
      if (!this.reflector.getAllAndOverride<boolean>(TOKEN_ACCESS, targets)) {
        throw new ForbiddenException('API tokens may only upload submittals and read their own project.');
      }
      request.user = user;
      return true;
    }
    return (await super.canActivate(context)) as boolean;
  }

  override handleRequest<T>(err: unknown, user: T): T {
    if (err || !user)
      throw new UnauthorizedException('Sign in first: this route needs a valid bearer token.');
    return user;
  }
}
