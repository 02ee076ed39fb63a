import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { DiscrepanciesModule } from '../discrepancies/discrepancies.module.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { Organisation } from '../organisations/models/organisation.model.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { Project } from '../projects/models/project.model.js';
import { SubmittalsModule } from '../submittals/submittals.module.js';
import { User } from '../users/models/user.model.js';
import { UsersModule } from '../users/users.module.js';
import { SeedService } from './seed.service.js';

@Module({
  imports: [
    SequelizeModule.forFeature([User, Organisation, Project, ProjectMember, Discrepancy]),
    UsersModule,
    SubmittalsModule,
    DiscrepanciesModule,
  ],
  providers: [SeedService],
  exports: [SeedService],
})
export class SeedModule {}
