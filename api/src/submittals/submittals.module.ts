import { Module } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { MulterModule } from '@nestjs/platform-express';
import { SequelizeModule } from '@nestjs/sequelize';
import { CalcFile } from '../calc-files/models/calc-file.model.js';
import { uploadsConfig } from '../config/index.js';
import { DiscrepancyRevisionsService } from '../discrepancies/discrepancy-revisions.service.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { EventsModule } from '../events/events.module.js';
import { MailModule } from '../mail/mail.module.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { Project } from '../projects/models/project.model.js';
import { MemberResult } from '../results/models/member-result.model.js';
import { Submittal } from './models/submittal.model.js';
import { RecheckService } from './recheck.service.js';
import { RecomputePool } from './recompute-pool.service.js';
import { RevisionsService } from './revisions.service.js';
import { SubmittalsController } from './submittals.controller.js';
import { SubmittalsService } from './submittals.service.js';

@Module({
  imports: [
    SequelizeModule.forFeature([Submittal, CalcFile, MemberResult, Discrepancy, Project, ProjectMember]),
    // Limits come from the validated config (uploads namespace); multer answers 413 for a file over
    // the size limit and 400 for too many files. Files stay in memory: they are stored as BLOBs.
    MulterModule.registerAsync({
      inject: [uploadsConfig.KEY],
      useFactory: (limits: ConfigType<typeof uploadsConfig>) => ({
        limits: { fileSize: limits.maxFileBytes, files: limits.maxFiles, fields: 10 },
        // Browsers and curl send a plain `filename` as UTF-8; busboy's default (latin1) double-encoded it.
        defParamCharset: 'utf8',
      }),
    }),
    EventsModule,
    MailModule,
  ],
  controllers: [SubmittalsController],
  // Carrying discrepancies across a revision is part of storing the revision (same transaction).
  providers: [
    SubmittalsService,
    RevisionsService,
    RecheckService,
    RecomputePool,
    DiscrepancyRevisionsService,
  ],
  exports: [SubmittalsService],
})
export class SubmittalsModule {}
