import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { codeLabel, designMethodOf } from 'ligament';
import { CalcFile } from '../calc-files/models/calc-file.model.js';
import type { MemberResultDto } from './dto/member-result.dto.js';
import { MemberResult } from './models/member-result.model.js';

@Injectable()
export class ResultsService {
  constructor(
    @InjectModel(MemberResult) private readonly results: typeof MemberResult,
    @InjectModel(CalcFile) private readonly files: typeof CalcFile,
  ) {}

  async list(submittalId: number): Promise<MemberResultDto[]> {
    const [rows, files] = await Promise.all([
      this.results.findAll({ where: { submittalId }, order: [['id', 'ASC']] }),
      this.files.findAll({ where: { submittalId }, attributes: ['id', 'fileName'] }),
    ]);
    const names = new Map(files.map((f) => [f.id, f.fileName]));
    return rows.map((r) => ({
      id: r.id,
      submittalId: r.submittalId,
      calcFileId: r.calcFileId,
      fileName: names.get(r.calcFileId) ?? '',
      memberId: r.memberId,
      engineVersion: r.engineVersion,
      profile: {
        standard: r.profile.standard,
        method: designMethodOf(r.profile),
        units: r.profile.units,
        label: codeLabel(r.profile),
      },
      inputsHash: r.inputsHash,
      Ag: r.Ag,
      An: r.An,
      Ae: r.Ae,
      U: r.U,
      yielding: r.yielding,
      rupture: r.rupture,
      available: r.available,
      governingDirection: r.governingDirection,
      directions: r.directions,
      result: r.result,
    }));
  }
}
