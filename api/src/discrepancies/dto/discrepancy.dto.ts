import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  Length,
  Min,
} from 'class-validator';
import { PageQuery } from '../../common/page.js';
import { EventDto } from '../../events/dto/event.dto.js';
import { FINDING_CLASSES, SEVERITIES } from '../../submittals/submittal-summary.js';
import { DISCREPANCY_STATUSES, type DiscrepancyStatus } from '../discrepancy-status.js';

const csv = ({ value }: { value: unknown }) =>
  typeof value === 'string'
    ? value
        .split(',')
        .map((v) => v.trim())
        .filter(Boolean)
    : value;

export const DISCREPANCY_SORTS = [
  'id',
  'createdAt',
  'updatedAt',
  'severity',
  'class',
  'status',
  'memberId',
  'code',
  'fileName',
] as const;
export type DiscrepancySort = (typeof DISCREPANCY_SORTS)[number];

export class ListDiscrepanciesQuery extends PageQuery {
  @ApiPropertyOptional() @IsOptional() @Type(() => Number) @IsInt() @Min(1) submittalId?: number;
  @ApiPropertyOptional({ description: `Comma-separated: ${FINDING_CLASSES.join(', ')}` })
  @IsOptional()
  @Transform(csv)
  @IsArray()
  @IsIn(FINDING_CLASSES, { each: true })
  class?: string[];
  @ApiPropertyOptional({ description: 'Comma-separated: error, warning, note' })
  @IsOptional()
  @Transform(csv)
  @IsArray()
  @IsIn(SEVERITIES, { each: true })
  severity?: string[];
  @ApiPropertyOptional({ description: `Comma-separated: ${DISCREPANCY_STATUSES.join(', ')}, or "open"` })
  @IsOptional()
  @Transform(csv)
  @IsArray()
  @IsIn([...DISCREPANCY_STATUSES, 'open'], { each: true })
  status?: string[];
  @ApiPropertyOptional({ example: 'SP-1' }) @IsOptional() @IsString() @Length(1, 100) memberId?: string;
  @ApiPropertyOptional({ example: 'LG101' }) @IsOptional() @IsString() @Length(1, 20) code?: string;
  @ApiPropertyOptional({ enum: DISCREPANCY_SORTS, default: 'id' })
  @IsOptional()
  @IsIn(DISCREPANCY_SORTS)
  sort: DiscrepancySort = 'id';
  @ApiPropertyOptional({ enum: ['asc', 'desc'], default: 'asc' }) @IsOptional() @IsIn(['asc', 'desc']) order:
    'asc' | 'desc' = 'asc';
}

export class DiscrepancyDto {
  @ApiProperty() id: number;
  @ApiProperty() projectId: number;
  @ApiProperty() submittalId: number;
  @ApiProperty() calcFileId: number;
  @ApiProperty() fileName: string;
  @ApiProperty({ nullable: true, type: String }) memberId: string | null;
  @ApiProperty({ example: 'LG101' }) code: string;
  @ApiProperty({ example: 'overstated-net-area' }) name: string;
  @ApiProperty({ enum: FINDING_CLASSES }) class: string;
  @ApiProperty({ enum: SEVERITIES }) severity: string;
  @ApiProperty({ nullable: true, type: String, enum: ['-x', '+x'] }) direction: string | null;
  @ApiProperty({ type: [String], description: 'Hole ids of the chain or holes concerned' }) chain: string[];
  @ApiProperty({ nullable: true, type: Number }) claimed: number | null;
  @ApiProperty({ nullable: true, type: Number }) recomputed: number | null;
  @ApiProperty({
    nullable: true,
    type: String,
    enum: ['in', 'mm'],
    description: 'Unit system of the calc file, which claimed and recomputed are in',
  })
  units: 'in' | 'mm' | null;
  @ApiProperty({
    nullable: true,
    type: String,
    enum: ['length', 'area', 'force', 'stress', 'ratio'],
    description:
      'What claimed and recomputed measure (in: in, in², kip, ksi; mm: mm, mm², kN, MPa; ratio: none); null without numbers',
  })
  quantity: 'length' | 'area' | 'force' | 'stress' | 'ratio' | null;
  @ApiProperty() message: string;
  @ApiProperty({ description: 'JSON pointer into the calc file' }) pointer: string;
  @ApiProperty({ enum: DISCREPANCY_STATUSES }) status: DiscrepancyStatus;
  @ApiProperty({ format: 'date-time', nullable: true, type: String }) acknowledgedAt: string | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ format: 'date-time' }) updatedAt: string;
}

export class DiscrepancyPageDto {
  @ApiProperty({ type: [DiscrepancyDto] }) items: DiscrepancyDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}

export class CommentViewDto {
  @ApiProperty() id: number;
  @ApiProperty() body: string;
  @ApiProperty() author: string;
  @ApiProperty() authorRole: string;
  @ApiProperty({ format: 'date-time' }) at: string;
}

export class DiscrepancyDetailDto extends DiscrepancyDto {
  @ApiProperty() raisedBy: string;
  @ApiProperty() submittalTitle: string;
  @ApiProperty({ type: [EventDto], description: 'Every move, comment and acknowledgement, oldest first' })
  history: EventDto[];
  @ApiProperty({ type: [CommentViewDto] }) comments: CommentViewDto[];
  @ApiProperty({
    enum: DISCREPANCY_STATUSES,
    isArray: true,
    description: 'Statuses the caller may move it to now',
  })
  allowedMoves: DiscrepancyStatus[];
  @ApiProperty({ description: 'Whether the caller may acknowledge it (owner’s rep, not yet acknowledged)' })
  canAcknowledge: boolean;
}

export class TransitionDto {
  @ApiProperty({ enum: ['answered', 'accepted', 'returned', 'waived'] })
  @IsIn(['answered', 'accepted', 'returned', 'waived'])
  to: DiscrepancyStatus;
  @ApiPropertyOptional({ description: 'answered: a note or a revision; returned and waived: the reason' })
  @IsOptional()
  @IsString()
  @Length(1, 4000)
  note?: string;
  @ApiPropertyOptional({ description: 'answered: the submittal that revises this discrepancy’s submittal' })
  @IsOptional()
  @IsInt()
  @Min(1)
  revisionSubmittalId?: number;
}

export class BulkTransitionDto {
  @ApiProperty({ type: [Number] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(500)
  @IsInt({ each: true })
  @Min(1, { each: true })
  ids: number[];
  @ApiProperty({ enum: ['accepted', 'returned', 'waived'] })
  @IsIn(['accepted', 'returned', 'waived'])
  to: DiscrepancyStatus;
  @ApiPropertyOptional() @IsOptional() @IsString() @Length(1, 4000) note?: string;
}

export class BulkResultDto {
  @ApiProperty() moved: number;
  @ApiProperty({ type: [DiscrepancyDto] }) items: DiscrepancyDto[];
}

export class CreateCommentDto {
  @ApiProperty() @IsString() @Length(1, 4000) body: string;
}
