import { ApiProperty } from '@nestjs/swagger';

export class ChainSummaryDto {
  @ApiProperty({ type: [String] }) holes: string[];
  @ApiProperty() netWidth: number;
  @ApiProperty() netArea: number;
}

export class DirectionResultDto {
  @ApiProperty({ enum: ['-x', '+x'] }) direction: string;
  @ApiProperty({ type: ChainSummaryDto, nullable: true }) governing: ChainSummaryDto | null;
  @ApiProperty({ type: [ChainSummaryDto] }) leastChains: ChainSummaryDto[];
  @ApiProperty() An: number;
}

export class CodeProfileDto {
  @ApiProperty({ example: 'AISC 360-22' }) standard: string;
  @ApiProperty({
    enum: ['LRFD', 'ASD', 'partial-factor', 'LSD'],
    description:
      "The code's own design method: LRFD or ASD (AISC 360), partial-factor (EN 1993-1-1), LSD (CSA S16-19, limit states design)",
  })
  method: string;
  @ApiProperty({ enum: ['in', 'mm'] }) units: string;
  @ApiProperty({
    example: 'EN 1993-1-1, partial factors γM0 1.00, γM2 1.25',
    description: 'Code and method as the reports name them',
  })
  label: string;
}

export class MemberResultDto {
  @ApiProperty() id: number;
  @ApiProperty() submittalId: number;
  @ApiProperty() calcFileId: number;
  @ApiProperty() fileName: string;
  @ApiProperty() memberId: string;
  @ApiProperty() engineVersion: string;
  @ApiProperty({ type: CodeProfileDto }) profile: CodeProfileDto;
  @ApiProperty({ description: 'sha256 of the canonical member input and profile' }) inputsHash: string;
  @ApiProperty() Ag: number;
  @ApiProperty() An: number;
  @ApiProperty() Ae: number;
  @ApiProperty() U: number;
  @ApiProperty({ description: 'Available yielding strength' }) yielding: number;
  @ApiProperty({ description: 'Available rupture strength' }) rupture: number;
  @ApiProperty({ description: 'Governing available strength' }) available: number;
  @ApiProperty() governingDirection: string;
  @ApiProperty({ type: [DirectionResultDto] }) directions: DirectionResultDto[];
  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description: 'The engine MemberResult (ligament package types)',
  })
  result: unknown;
}
