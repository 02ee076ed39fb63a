import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Length, Min } from 'class-validator';
import { FINDING_CLASSES, SEVERITIES } from '../submittal-summary.js';
import { STAMP_ACTIONS, type StampAction } from '../models/submittal.model.js';

/** Multipart fields beside `files`. */
export class CreateSubmittalDto {
  @ApiProperty({ example: 'Splice plates, level 2 deck' }) @IsString() @Length(1, 200) title: string;
  @ApiPropertyOptional({ description: 'Id of the submittal this one revises (same project)' })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  revisionOf?: number;
}

/** Swagger view of the multipart body. */
export class UploadSubmittalBodyDto extends CreateSubmittalDto {
  @ApiProperty({
    type: 'array',
    items: { type: 'string', format: 'binary' },
    description: 'Calc files (.json)',
  })
  files: unknown[];
}

export class CountsByClassDto {
  @ApiProperty() overstated: number;
  @ApiProperty() understated: number;
  @ApiProperty({ name: 'missed-chain' }) 'missed-chain': number;
  @ApiProperty({ name: 'phantom-chain' }) 'phantom-chain': number;
  @ApiProperty({ name: 'chain-width' }) 'chain-width': number;
  @ApiProperty({ name: 'equal-share' }) 'equal-share': number;
  @ApiProperty() detailing: number;
  @ApiProperty() input: number;
}

export class CountsBySeverityDto {
  @ApiProperty() error: number;
  @ApiProperty() warning: number;
  @ApiProperty() note: number;
}

export class WorstFindingDto {
  @ApiProperty({ example: 'LG101' }) code: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: FINDING_CLASSES }) class: string;
  @ApiProperty({ enum: SEVERITIES }) severity: string;
  @ApiProperty() fileName: string;
  @ApiProperty({ nullable: true, type: String }) memberId: string | null;
  @ApiProperty() message: string;
}

export class SummaryDto {
  @ApiProperty() files: number;
  @ApiProperty() members: number;
  @ApiProperty() findings: number;
  @ApiProperty({ type: CountsByClassDto }) byClass: CountsByClassDto;
  @ApiProperty({ type: CountsBySeverityDto }) bySeverity: CountsBySeverityDto;
  @ApiProperty({ type: WorstFindingDto, nullable: true }) worst: WorstFindingDto | null;
}

export class StampDto {
  @ApiProperty({ enum: STAMP_ACTIONS }) action: StampAction;
  @ApiProperty() comment: string;
  @ApiProperty({ nullable: true, type: String }) overrideReason: string | null;
  @ApiProperty() stampedBy: string;
  @ApiProperty({ format: 'date-time' }) stampedAt: string;
}

export class SubmittalDto {
  @ApiProperty() id: number;
  @ApiProperty() projectId: number;
  @ApiProperty() title: string;
  @ApiProperty({ nullable: true, type: Number }) revisionOfId: number | null;
  @ApiProperty({ type: [Number], description: 'Submittals that revise this one' }) revisedBy: number[];
  @ApiProperty() submittedBy: string;
  @ApiProperty() viaApiToken: boolean;
  @ApiProperty() engineVersion: string;
  @ApiProperty({ enum: ['checked', 'stamped'] }) status: 'checked' | 'stamped';
  @ApiProperty({ type: SummaryDto }) summary: SummaryDto;
  @ApiProperty({ description: 'Discrepancies still raised, answered or returned' }) openDiscrepancies: number;
  @ApiProperty({ type: StampDto, nullable: true }) stamp: StampDto | null;
  @ApiProperty({ example: '/submittals/12' }) webPath: string;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

/** The answer to an upload. */
export class UploadResultDto {
  @ApiProperty() submittalId: number;
  @ApiProperty() projectId: number;
  @ApiProperty() title: string;
  @ApiProperty({ nullable: true, type: Number }) revisionOfId: number | null;
  @ApiProperty() engineVersion: string;
  @ApiProperty({ type: SummaryDto }) summary: SummaryDto;
  @ApiProperty({ example: '/submittals/12' }) webPath: string;
  @ApiProperty({ example: 'http://localhost:3000/submittals/12' }) webUrl: string;
}

export class StampSubmittalDto {
  @ApiProperty({ enum: STAMP_ACTIONS }) @IsIn(STAMP_ACTIONS) action: StampAction;
  @ApiProperty() @IsString() @Length(1, 4000) comment: string;
  @ApiPropertyOptional({ description: 'Required to stamp while error-severity discrepancies are open' })
  @IsOptional()
  @IsString()
  @Length(1, 4000)
  overrideReason?: string;
}
