import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { randomBytes } from 'node:crypto';
import { TooManyRequestsException } from '../common/too-many-requests.exception.js';
import { authConfig } from '../config/index.js';
import { SessionsService, type SessionGrant } from '../sessions/sessions.service.js';
import { UsersService } from '../users/users.service.js';
import type { AuthUser, JwtPayload } from './auth-user.js';
import type { LoginDto, LoginResponseDto, MeDto } from './dto/login.dto.js';
import { LoginAttemptsService } from './login-attempts.service.js';
import { hashPassword, verifyPassword } from './password.js';

@Injectable()
export class AuthService {
  /** A hash no typed password matches, made once at start-up with the same scrypt parameters. */
  private readonly dummyHash: Promise<string> = hashPassword(randomBytes(32).toString('base64'));

  constructor(
    private readonly users: UsersService,
    private readonly jwt: JwtService,
    private readonly attempts: LoginAttemptsService,
    private readonly sessions: SessionsService,
    @Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>,
  ) {}

  /**
   * One answer, after the same work, for an unknown e-mail, an inactive account, an account that has
   * not set a password and a wrong password: no account probing by answer or by time. Only failures
   * count toward the per-account and per-address limits.
   */
  async login(
    dto: LoginDto,
    address: string,
    userAgent?: string,
  ): Promise<{ body: LoginResponseDto; grant: SessionGrant }> {
    const wait = this.attempts.retryAfterSeconds(dto.email, address);
    if (wait > 0) {
      throw new TooManyRequestsException(
        `Too many failed sign-ins for this account or from this address; try again in ${wait} s.`,
        wait,
      );
    }
    const user = await this.users.findByEmail(dto.email);
    const hash = user?.active ? user.passwordHash : null;
    const ok = hash ? await verifyPassword(dto.password, hash) : await this.verifyDummy(dto.password);
    if (!user || !ok) {
      this.attempts.recordFailure(dto.email, address);
      throw new UnauthorizedException('E-mail or password is wrong.');
    }
    this.attempts.recordSuccess(dto.email);
    const grant = await this.sessions.start(user.id, userAgent);
    return { body: await this.accessFor(grant), grant };
  }

  /** A new access token for the session behind a refresh cookie (rotating the cookie's token). */
  async refresh(presented: string | undefined): Promise<{ body: LoginResponseDto; grant: SessionGrant }> {
    const grant = await this.sessions.refresh(presented);
    const body = await this.accessFor(grant);
    return { body, grant };
  }

  signOut(presented: string | undefined): Promise<void> {
    return this.sessions.endByToken(presented);
  }

  /** An access token naming the session, for its user (who must still be active). */
  private async accessFor(grant: SessionGrant): Promise<LoginResponseDto> {
    const user = await this.users.get(grant.userId);
    if (!user.active) throw new UnauthorizedException('This account has been deactivated.');
    const payload: JwtPayload = { sub: user.id, role: user.role, sid: grant.sessionId };
    return {
      accessToken: await this.jwt.signAsync(payload),
      expiresIn: this.config.jwtExpiresIn,
      user,
    };
  }

  /** The scrypt work of a real check, for accounts that cannot sign in; always false. */
  async verifyDummy(password: string): Promise<false> {
    await verifyPassword(password, await this.dummyHash);
    return false;
  }

  async me(caller: AuthUser): Promise<MeDto> {
    const user = await this.users.get(caller.id);
    return {
      ...user,
      via: caller.token ? 'api-token' : 'password',
      tokenProjectId: caller.token?.projectId ?? null,
    };
  }
}
