import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { CalcFile } from '../calc-files/models/calc-file.model.js';
import { MemberResult } from './models/member-result.model.js';
import { ResultsController } from './results.controller.js';
import { ResultsService } from './results.service.js';

@Module({
  imports: [SequelizeModule.forFeature([MemberResult, CalcFile])],
  controllers: [ResultsController],
  providers: [ResultsService],
  exports: [ResultsService],
})
export class ResultsModule {}
