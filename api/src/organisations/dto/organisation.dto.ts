import { ApiProperty } from '@nestjs/swagger';
import { IsIn, IsString, Length } from 'class-validator';
import type { OrganisationKind } from '../models/organisation.model.js';

export const ORGANISATION_KINDS: readonly OrganisationKind[] = ['consultant', 'checker', 'owner', 'operator'];

export class CreateOrganisationDto {
  @ApiProperty({ example: 'Fennick & Ode Structural' }) @IsString() @Length(1, 200) name: string;
  @ApiProperty({ enum: ORGANISATION_KINDS }) @IsIn(ORGANISATION_KINDS) kind: OrganisationKind;
}

export class OrganisationDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ORGANISATION_KINDS }) kind: OrganisationKind;
}
