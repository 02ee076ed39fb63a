import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AuthModule } from '../auth/auth.module.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { EventsModule } from '../events/events.module.js';
import { Organisation } from '../organisations/models/organisation.model.js';
import { Submittal } from '../submittals/models/submittal.model.js';
import { TokensModule } from '../tokens/tokens.module.js';
import { User } from '../users/models/user.model.js';
import { UsersModule } from '../users/users.module.js';
import { ProjectMember } from './models/project-member.model.js';
import { Project } from './models/project.model.js';
import { ProjectsController } from './projects.controller.js';
import { ProjectsService } from './projects.service.js';

@Module({
  imports: [
    SequelizeModule.forFeature([Project, ProjectMember, Submittal, Discrepancy, User, Organisation]),
    AuthModule,
    UsersModule,
    EventsModule,
    TokensModule,
  ],
  controllers: [ProjectsController],
  providers: [ProjectsService],
  exports: [ProjectsService],
})
export class ProjectsModule {}
