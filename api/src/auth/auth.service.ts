import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { authConfig } from '../config/index.js';
import { UsersService } from '../users/users.service.js';
import type { AuthUser, JwtPayload } from './auth-user.js';
import type { LoginDto, LoginResponseDto, MeDto } from './dto/login.dto.js';
import { verifyPassword } from './password.js';

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly jwt: JwtService,
    @Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>,
  ) {}

  async login(dto: LoginDto): Promise<LoginResponseDto> {
    const user = await this.users.findByEmail(dto.email);
    // One answer for unknown e-mail, wrong password and inactive account: no account probing.
    const ok =
      user?.passwordHash && user.active ? await verifyPassword(dto.password, user.passwordHash) : false;
    if (!user || !ok) throw new UnauthorizedException('E-mail or password is wrong.');
    const payload: JwtPayload = { sub: user.id, role: user.role };
    return {
      accessToken: await this.jwt.signAsync(payload),
      expiresIn: this.config.jwtExpiresIn,
      user: await this.users.get(user.id),
    };
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
