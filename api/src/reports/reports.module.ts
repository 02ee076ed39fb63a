import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AuthModule } from '../auth/auth.module.js';
import { CalcFile } from '../calc-files/models/calc-file.model.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { Project } from '../projects/models/project.model.js';
import { MemberResult } from '../results/models/member-result.model.js';
import { Submittal } from '../submittals/models/submittal.model.js';
import { SubmittalsModule } from '../submittals/submittals.module.js';
import { DashboardService } from './dashboard.service.js';
import { ReportsController } from './reports.controller.js';
import { ReviewReportService } from './review-report.service.js';

@Module({
  imports: [
    SequelizeModule.forFeature([MemberResult, Discrepancy, CalcFile, Project, Submittal]),
    SubmittalsModule,
    AuthModule,
  ],
  controllers: [ReportsController],
  providers: [DashboardService, ReviewReportService],
})
export class ReportsModule {}
