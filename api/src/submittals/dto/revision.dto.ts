import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

/** One change between two versions of a calc file, by meaning (ligament's diffDocuments). */
export class DocumentChangeDto {
  @ApiProperty({ enum: ['profile', 'member', 'hole', 'claim'] }) scope:
    'profile' | 'member' | 'hole' | 'claim';
  @ApiProperty({ enum: ['added', 'removed', 'changed', 'moved'] }) change:
    'added' | 'removed' | 'changed' | 'moved';
  @ApiPropertyOptional() memberId?: string;
  @ApiPropertyOptional() holeId?: string;
  @ApiPropertyOptional({ example: 'claims.An', description: 'Path of the field in the normalised document' })
  field?: string;
  @ApiPropertyOptional({ example: 'claimed An', description: 'The field in words' }) label?: string;
  @ApiPropertyOptional({ example: '5.75 in²', description: 'Old value with its unit' }) before?: string;
  @ApiPropertyOptional({ example: '5.125 in²', description: 'New value with its unit' }) after?: string;
}

export class FileDiffDto {
  @ApiProperty({ enum: ['changed', 'unchanged', 'added', 'removed'] }) change:
    'changed' | 'unchanged' | 'added' | 'removed';
  @ApiProperty({ nullable: true, type: String }) previousFile: string | null;
  @ApiProperty({ nullable: true, type: String }) currentFile: string | null;
  @ApiProperty({ enum: ['file-name', 'member-ids', 'none'], description: 'How the two files were paired' })
  matchedBy: string;
  @ApiProperty({
    description:
      'Unified diff (diff package) of the canonical JSON (sorted keys, 2 spaces); "" when unchanged',
  })
  patch: string;
  @ApiProperty({
    type: [DocumentChangeDto],
    nullable: true,
    description:
      'The same change by meaning: members, holes and claims old → new with units (every member of an ' +
      'added or removed file); null when a stored document could not be compared',
  })
  changes: DocumentChangeDto[] | null;
}

export class DiffDiscrepancyDto {
  @ApiProperty() id: number;
  @ApiProperty() code: string;
  @ApiProperty({ nullable: true, type: String }) memberId: string | null;
  @ApiProperty({ nullable: true, type: String }) chain: string | null;
  @ApiProperty() severity: string;
  @ApiProperty() status: string;
  @ApiProperty() message: string;
}

export class KeptDiscrepancyDto {
  @ApiProperty({ type: DiffDiscrepancyDto }) previous: DiffDiscrepancyDto;
  @ApiProperty({ type: DiffDiscrepancyDto }) current: DiffDiscrepancyDto;
}

export class RevisionDiffDto {
  @ApiProperty() submittalId: number;
  @ApiProperty() previousSubmittalId: number;
  @ApiProperty({ type: [FileDiffDto] }) files: FileDiffDto[];
  @ApiProperty({ type: [DiffDiscrepancyDto], description: 'In the previous submittal, gone from this one' })
  closed: DiffDiscrepancyDto[];
  @ApiProperty({ type: [KeptDiscrepancyDto], description: 'In both (same code, member and chain)' })
  kept: KeptDiscrepancyDto[];
  @ApiProperty({ type: [DiffDiscrepancyDto], description: 'New in this one' }) opened: DiffDiscrepancyDto[];
}

export class RecheckFindingDto {
  @ApiProperty() fileName: string;
  @ApiProperty() code: string;
  @ApiProperty({ nullable: true, type: String }) memberId: string | null;
  @ApiProperty({ nullable: true, type: String }) chain: string | null;
  @ApiProperty() severity: string;
  @ApiProperty() message: string;
}

export class RecheckValueChangeDto {
  @ApiProperty() fileName: string;
  @ApiProperty() memberId: string;
  @ApiProperty({ example: 'An' }) field: string;
  @ApiProperty({ nullable: true, type: Number }) stored: number | null;
  @ApiProperty({ nullable: true, type: Number }) current: number | null;
  @ApiProperty({ enum: ['in', 'mm'], description: 'Unit system of the calc file' }) units: 'in' | 'mm';
  @ApiProperty({
    nullable: true,
    type: String,
    enum: ['length', 'area', 'force', 'stress', 'ratio'],
    description: 'What stored and current measure; null for inputsHash',
  })
  quantity: 'length' | 'area' | 'force' | 'stress' | 'ratio' | null;
}

export class RecheckDto {
  @ApiProperty() submittalId: number;
  @ApiProperty() storedEngineVersion: string;
  @ApiProperty() currentEngineVersion: string;
  @ApiProperty({ description: 'True when anything below differs' }) changed: boolean;
  @ApiProperty({ type: [RecheckValueChangeDto] }) valueChanges: RecheckValueChangeDto[];
  @ApiProperty({ type: [RecheckFindingDto] }) newFindings: RecheckFindingDto[];
  @ApiProperty({ type: [RecheckFindingDto] }) goneFindings: RecheckFindingDto[];
  @ApiProperty() unchangedFindings: number;
  @ApiProperty({
    type: 'array',
    items: { type: 'object', additionalProperties: true },
    description: 'CalcErrors if a stored file no longer loads',
  })
  loadErrors: unknown[];
}
