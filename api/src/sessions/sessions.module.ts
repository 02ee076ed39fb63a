import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { EventsModule } from '../events/events.module.js';
import { RefreshToken } from './models/refresh-token.model.js';
import { Session } from './models/session.model.js';
import { SameOriginGuard } from './same-origin.guard.js';
import { SessionsService } from './sessions.service.js';

/** Browser sessions (refresh cookie, rotation, reuse detection); the routes are AuthController's. */
@Module({
  imports: [SequelizeModule.forFeature([Session, RefreshToken]), EventsModule],
  providers: [SessionsService, SameOriginGuard],
  exports: [SessionsService, SameOriginGuard],
})
export class SessionsModule {}
