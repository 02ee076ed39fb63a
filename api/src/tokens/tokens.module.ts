import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { EventsModule } from '../events/events.module.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { User } from '../users/models/user.model.js';
import { ApiToken } from './models/api-token.model.js';
import { TokensController } from './tokens.controller.js';
import { TokensService } from './tokens.service.js';

@Module({
  imports: [SequelizeModule.forFeature([ApiToken, User, ProjectMember]), EventsModule],
  controllers: [TokensController],
  providers: [TokensService],
  exports: [TokensService],
})
export class TokensModule {}
