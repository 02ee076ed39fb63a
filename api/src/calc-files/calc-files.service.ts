import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { CalcFileDetailDto, CalcFileDto } from './dto/calc-file.dto.js';
import { CalcFile } from './models/calc-file.model.js';

@Injectable()
export class CalcFilesService {
  constructor(@InjectModel(CalcFile) private readonly files: typeof CalcFile) {}

  async list(submittalId: number): Promise<CalcFileDto[]> {
    const rows = await this.files.findAll({
      where: { submittalId },
      attributes: { exclude: ['content', 'document'] },
      order: [['id', 'ASC']],
    });
    return rows.map((f) => this.view(f));
  }

  async get(id: number): Promise<CalcFileDetailDto> {
    const file = await this.find(id);
    return { ...this.view(file), document: file.document };
  }

  /** The original bytes, exactly as uploaded. */
  async content(id: number): Promise<{ fileName: string; content: Buffer; sha256: string }> {
    const file = await this.find(id);
    return { fileName: file.fileName, content: file.content, sha256: file.sha256 };
  }

  private async find(id: number): Promise<CalcFile> {
    const file = await this.files.findByPk(id);
    if (!file) throw new NotFoundException(`No calc file ${id}.`);
    return file;
  }

  private view(f: CalcFile): CalcFileDto {
    return {
      id: f.id,
      submittalId: f.submittalId,
      fileName: f.fileName,
      size: f.size,
      sha256: f.sha256,
      memberIds: f.memberIds,
      createdAt: new Date(f.createdAt).toISOString(),
    };
  }
}
