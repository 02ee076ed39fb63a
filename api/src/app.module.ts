import { Module } from '@nestjs/common';
import { ConfigModule, type ConfigType } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { ThrottlerGuard, ThrottlerModule } from '@nestjs/throttler';
import { existsSync } from 'node:fs';
import { AuthModule } from './auth/auth.module.js';
import { AuthenticationGuard } from './auth/guards/authentication.guard.js';
import { ProjectAccessGuard } from './auth/guards/project-access.guard.js';
import { RolesGuard } from './auth/guards/roles.guard.js';
import { CalcFilesModule } from './calc-files/calc-files.module.js';
import { appConfig, configNamespaces, throttleConfig, validateEnvironment } from './config/index.js';
import { DatabaseModule } from './database/database.module.js';
import { DiscrepanciesModule } from './discrepancies/discrepancies.module.js';
import { EventsModule } from './events/events.module.js';
import { HealthModule } from './health/health.module.js';
import { MailModule } from './mail/mail.module.js';
import { NotificationsModule } from './notifications/notifications.module.js';
import { OrganisationsModule } from './organisations/organisations.module.js';
import { ProjectsModule } from './projects/projects.module.js';
import { ReportsModule } from './reports/reports.module.js';
import { ResultsModule } from './results/results.module.js';
import { SeedModule } from './seed/seed.module.js';
import { SubmittalsModule } from './submittals/submittals.module.js';
import { TokensModule } from './tokens/tokens.module.js';
import { UsersModule } from './users/users.module.js';

@Module({
  imports: [
    ConfigModule.forRoot({
      isGlobal: true,
      ignoreEnvFile: true,
      load: configNamespaces,
      validate: validateEnvironment,
    }),
    DatabaseModule,
    ThrottlerModule.forRootAsync({
      inject: [throttleConfig.KEY],
      useFactory: (t: ConfigType<typeof throttleConfig>) => ({
        // Sign-in has its own limits on failures per account and address (LoginAttemptsService).
        throttlers: [{ name: 'default', ttl: t.ttlMs, limit: t.limit }],
        errorMessage: 'Too many requests; wait a moment and try again.',
      }),
    }),
    ServeStaticModule.forRootAsync({
      inject: [appConfig.KEY],
      // The built web app on the same port; every non-/api path falls back to index.html (SPA).
      useFactory: (app: ConfigType<typeof appConfig>) =>
        existsSync(`${app.webDist}/index.html`)
          ? [{ rootPath: app.webDist, exclude: ['/api', '/api/{*rest}'] }]
          : [],
    }),
    AuthModule,
    UsersModule,
    OrganisationsModule,
    ProjectsModule,
    TokensModule,
    SubmittalsModule,
    CalcFilesModule,
    ResultsModule,
    DiscrepanciesModule,
    EventsModule,
    MailModule,
    NotificationsModule,
    ReportsModule,
    HealthModule,
    SeedModule,
  ],
  providers: [
    // Order matters: throttle → who are you → may your role → are you on this project.
    { provide: APP_GUARD, useClass: ThrottlerGuard },
    { provide: APP_GUARD, useExisting: AuthenticationGuard },
    { provide: APP_GUARD, useExisting: RolesGuard },
    { provide: APP_GUARD, useExisting: ProjectAccessGuard },
  ],
})
export class AppModule {}
