import { Module } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { SequelizeModule } from '@nestjs/sequelize';
import type { StringValue } from 'ms';
import { CalcFile } from '../calc-files/models/calc-file.model.js';
import { authConfig } from '../config/index.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { Project } from '../projects/models/project.model.js';
import { SessionsModule } from '../sessions/sessions.module.js';
import { Submittal } from '../submittals/models/submittal.model.js';
import { TokensModule } from '../tokens/tokens.module.js';
import { UsersModule } from '../users/users.module.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { AuthenticationGuard } from './guards/authentication.guard.js';
import { ProjectAccessGuard } from './guards/project-access.guard.js';
import { RolesGuard } from './guards/roles.guard.js';
import { JwtStrategy } from './jwt.strategy.js';
import { LoginAttemptsService } from './login-attempts.service.js';
import { ProjectAccessService } from './project-access.service.js';

/**
 * Sign-in and access. The three guards are exported and registered as APP_GUARD by AppModule in
 * order: authentication → roles → project membership.
 */
@Module({
  imports: [
    UsersModule,
    TokensModule,
    SessionsModule,
    PassportModule,
    SequelizeModule.forFeature([Project, ProjectMember, Submittal, Discrepancy, CalcFile]),
    JwtModule.registerAsync({
      inject: [authConfig.KEY],
      useFactory: (config: ConfigType<typeof authConfig>) => ({
        secret: config.jwtSecret,
        signOptions: { expiresIn: config.jwtExpiresIn as StringValue },
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    LoginAttemptsService,
    JwtStrategy,
    ProjectAccessService,
    AuthenticationGuard,
    RolesGuard,
    ProjectAccessGuard,
  ],
  exports: [ProjectAccessService, AuthenticationGuard, RolesGuard, ProjectAccessGuard],
})
export class AuthModule {}
