import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { EventsModule } from '../events/events.module.js';
import { MailModule } from '../mail/mail.module.js';
import { Organisation } from '../organisations/models/organisation.model.js';
import { SessionsModule } from '../sessions/sessions.module.js';
import { InvitationsController } from './invitations.controller.js';
import { InvitationsService } from './invitations.service.js';
import { Invitation } from './models/invitation.model.js';
import { User } from './models/user.model.js';
import { UsersController } from './users.controller.js';
import { UsersService } from './users.service.js';

@Module({
  imports: [
    SequelizeModule.forFeature([User, Invitation, Organisation]),
    MailModule,
    EventsModule,
    SessionsModule,
  ],
  controllers: [UsersController, InvitationsController],
  providers: [UsersService, InvitationsService],
  exports: [UsersService, InvitationsService],
})
export class UsersModule {}
