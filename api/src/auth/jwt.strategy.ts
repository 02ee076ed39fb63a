import { Inject, Injectable } from '@nestjs/common';
import { createSecretKey } from 'node:crypto';
import type { ConfigType } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { authConfig } from '../config/index.js';
import { UsersService } from '../users/users.service.js';
import type { AuthUser, JwtPayload } from './auth-user.js';

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(authConfig.KEY) config: ConfigType<typeof authConfig>,
    private readonly users: UsersService,
  ) {
    // A KeyObject made once: given a string, jsonwebtoken builds a key on every verify (trying a public
    // key first and throwing), which was the largest cost of an authenticated request.
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      ignoreExpiration: false,
      secretOrKey: createSecretKey(Buffer.from(config.jwtSecret, 'utf8')) as unknown as string,
      algorithms: ['HS256'],
    });
  }

  /**
   * A valid signature is not enough: the token must expire (jsonwebtoken checks `exp` only when it is
   * present, and a token without one would be good forever), the user must still exist and be active,
   * and the session it was issued for must not have ended (signed out, reuse detected, deactivated).
   */
  async validate(payload: JwtPayload): Promise<AuthUser | null> {
    if (typeof payload.exp !== 'number' || !Number.isSafeInteger(payload.sub)) return null;
    if (!Number.isSafeInteger(payload.sid)) return null;
    return this.users.findActive(payload.sub, payload.sid);
  }
}
