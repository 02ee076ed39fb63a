import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { EventsModule } from '../events/events.module.js';
import { NotificationsModule } from '../notifications/notifications.module.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { Project } from '../projects/models/project.model.js';
import { Submittal } from '../submittals/models/submittal.model.js';
import { DiscrepanciesController } from './discrepancies.controller.js';
import { DiscrepanciesService } from './discrepancies.service.js';
import { DiscrepancyComment } from './models/discrepancy-comment.model.js';
import { Discrepancy } from './models/discrepancy.model.js';

@Module({
  imports: [
    SequelizeModule.forFeature([Discrepancy, DiscrepancyComment, Submittal, ProjectMember, Project]),
    EventsModule,
    NotificationsModule,
  ],
  controllers: [DiscrepanciesController],
  providers: [DiscrepanciesService],
  exports: [DiscrepanciesService],
})
export class DiscrepanciesModule {}
