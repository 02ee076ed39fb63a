import { ConflictException, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { UniqueConstraintError } from 'sequelize';
import type { CreateOrganisationDto, OrganisationDto } from './dto/organisation.dto.js';
import { Organisation } from './models/organisation.model.js';

@Injectable()
export class OrganisationsService {
  constructor(@InjectModel(Organisation) private readonly organisations: typeof Organisation) {}

  async list(): Promise<OrganisationDto[]> {
    const rows = await this.organisations.findAll({ order: [['name', 'ASC']] });
    return rows.map((o) => ({ id: o.id, name: o.name, kind: o.kind }));
  }

  async create(dto: CreateOrganisationDto): Promise<OrganisationDto> {
    try {
      const o = await this.organisations.create({ name: dto.name, kind: dto.kind });
      return { id: o.id, name: o.name, kind: o.kind };
    } catch (error) {
      if (error instanceof UniqueConstraintError)
        throw new ConflictException(`An organisation named "${dto.name}" exists.`);
      throw error;
    }
  }
}
