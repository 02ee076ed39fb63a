import { CanActivate, ExecutionContext, ForbiddenException, Inject, Injectable } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import type { Request } from 'express';
import { appConfig } from '../config/index.js';
import { SESSION_HEADER } from './session-cookie.js';

/** The origin of a URL, or null when it is not one. */
function originOf(url: string): string | null {
  try {
    return new URL(url).origin;
  } catch {
    return null;
  }
}

/**
 * Cross-site request forgery defence for the routes the refresh cookie authenticates (refresh and
 * sign-out). Three layers: the cookie is SameSite=Strict; the request must carry the
 * `X-Ligament-Session` header, which a form or a cross-site fetch cannot add without a CORS
 * preflight this service never answers; and its Origin (or, failing that, Referer) must be this
 * service's own, either its public address or the host the request was sent to. A double-submit
 * token would need a second, script-readable cookie for nothing more: the app is served from the
 * same origin as the API.
 */
@Injectable()
export class SameOriginGuard implements CanActivate {
  constructor(@Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>) {}

  canActivate(context: ExecutionContext): boolean {
    const request = context.switchToHttp().getRequest<Request>();
    if (request.headers[SESSION_HEADER] !== '1') {
      throw new ForbiddenException(
        `Session requests must carry the header X-Ligament-Session: 1 (cross-site request forgery defence).`,
      );
    }
    const origin = request.headers.origin ?? originOf(request.headers.referer ?? '');
    const own = new Set([
      originOf(this.app.publicUrl),
      `${request.protocol}://${request.headers.host ?? ''}`,
    ]);
    if (!origin || !own.has(origin)) {
      throw new ForbiddenException(
        `Session requests must come from this service's own pages (Origin ${origin ?? 'missing'} is not one of them).`,
      );
    }
    return true;
  }
}
