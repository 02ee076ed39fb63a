import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { CalcFilesController } from './calc-files.controller.js';
import { CalcFilesService } from './calc-files.service.js';
import { CalcFile } from './models/calc-file.model.js';

@Module({
  imports: [SequelizeModule.forFeature([CalcFile])],
  controllers: [CalcFilesController],
  providers: [CalcFilesService],
})
export class CalcFilesModule {}
