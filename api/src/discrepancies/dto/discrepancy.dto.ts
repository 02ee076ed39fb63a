import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  IsISO8601,
  IsOptional,
  IsString,
  Length,
  Matches,
  Min,
  ValidateIf,
} from 'class-validator';
import { PageQuery } from '../../common/page.js';
import { EventDto } from '../../events/dto/event.dto.js';
import { FINDING_CLASSES, SEVERITIES } from '../../submittals/submittal-summary.js';
import {
  BULK_TARGETS,
  DISCREPANCY_STATUSES,
  type DiscrepancyStatus,
  type MoveAction,
} from '../discrepancy-status.js';

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
  'submittalId',
  'dueDate',
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
  @ApiPropertyOptional({
    example: 'zigzag',
    description:
      'Free text: matches the message, member, file, code, name or pointer (case-insensitive); "#12" or "12" also matches discrepancy 12',
  })
  @IsOptional()
  @IsString()
  @Length(1, 200)
  q?: string;
  @ApiPropertyOptional({ description: 'Only those assigned to this user' })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  assigneeId?: number;
  @ApiPropertyOptional({
    default: false,
    description:
      'Also items a later revision re-checked (carried on or resolved); by default only current ones',
  })
  @IsOptional()
  @Transform(({ value }) => value === true || value === 'true')
  @IsBoolean()
  includeSuperseded: boolean = false;
  @ApiPropertyOptional({ enum: DISCREPANCY_SORTS, default: 'id' })
  @IsOptional()
  @IsIn(DISCREPANCY_SORTS)
  sort: DiscrepancySort = 'id';
  @ApiPropertyOptional({ enum: ['asc', 'desc'], default: 'asc' }) @IsOptional() @IsIn(['asc', 'desc']) order:
    'asc' | 'desc' = 'asc';
}

export class PersonDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
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
  @ApiProperty({
    description:
      'Raised by every change; send it back with a move or an assignment to be told if someone else changed it first',
  })
  version: number;
  @ApiProperty({ format: 'date-time', nullable: true, type: String }) acknowledgedAt: string | null;
  @ApiProperty({ description: 'Not superseded: no later revision has re-checked it' }) current: boolean;
  @ApiProperty({
    nullable: true,
    type: Number,
    description: 'The revision that re-checked it (carried it on or resolved it)',
  })
  supersededBySubmittalId: number | null;
  @ApiProperty({
    nullable: true,
    type: Number,
    description: 'The item of the revised submittal it continues',
  })
  carriedFromId: number | null;
  @ApiProperty({ nullable: true, type: PersonDto }) assignee: PersonDto | null;
  @ApiProperty({ nullable: true, type: String, format: 'date', example: '2026-12-18' }) dueDate:
    string | null;
  @ApiProperty({ format: 'date-time', description: 'When the first submittal of its lineage raised it' })
  firstRaisedAt: string;
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
  @ApiProperty({ description: 'The item it was written on (this one or one it continues)' })
  discrepancyId: number;
  @ApiProperty() body: string;
  @ApiProperty() author: string;
  @ApiProperty() authorRole: string;
  @ApiProperty({ format: 'date-time' }) at: string;
}

export class MoveOptionDto {
  @ApiProperty({ enum: ['answer', 'accept', 'return', 'waive', 'reopen'] }) action: MoveAction;
  @ApiProperty({ enum: DISCREPANCY_STATUSES, description: 'Where it lands' }) to: DiscrepancyStatus;
  @ApiProperty({ enum: ['note-or-revision', 'reason', 'none'] }) requires: string;
}

export class LineageItemDto {
  @ApiProperty() id: number;
  @ApiProperty() submittalId: number;
  @ApiProperty() submittalTitle: string;
  @ApiProperty({ enum: DISCREPANCY_STATUSES }) status: DiscrepancyStatus;
}

export class DiscrepancyDetailDto extends DiscrepancyDto {
  @ApiProperty() raisedBy: string;
  @ApiProperty() submittalTitle: string;
  @ApiProperty({
    type: [EventDto],
    description:
      'Every move, comment and acknowledgement, oldest first, of this item and of those it continues',
  })
  history: EventDto[];
  @ApiProperty({ type: [CommentViewDto], description: 'Of this item and of those it continues' })
  comments: CommentViewDto[];
  @ApiProperty({
    type: [LineageItemDto],
    description: 'This item and those it continues across revisions, oldest first',
  })
  lineage: LineageItemDto[];
  @ApiProperty({
    nullable: true,
    type: LineageItemDto,
    description: 'The item that continues it, if carried on',
  })
  carriedInto: LineageItemDto | null;
  @ApiProperty({ nullable: true, type: String, example: 'resolved by #2' }) resolution: string | null;
  @ApiProperty({
    enum: DISCREPANCY_STATUSES,
    isArray: true,
    description: 'Statuses the caller may move it to now',
  })
  allowedMoves: DiscrepancyStatus[];
  @ApiProperty({ type: [MoveOptionDto], description: 'The moves the caller may make now, by name' })
  moves: MoveOptionDto[];
  @ApiProperty({ description: 'Whether the caller may acknowledge it (owner’s rep, not yet acknowledged)' })
  canAcknowledge: boolean;
  @ApiProperty({
    description: 'Whether the caller may set the assignee and due date (checker, current item)',
  })
  canAssign: boolean;
  @ApiProperty({ description: 'Whether the caller may comment (consultant or checker, current item)' })
  canComment: boolean;
}

export class AssignDto {
  @ApiPropertyOptional({
    nullable: true,
    type: Number,
    description: 'A consultant or checker of the project; null to clear; absent to keep',
  })
  @ValidateIf((o: AssignDto) => o.assigneeId !== null && o.assigneeId !== undefined)
  @IsInt()
  @Min(1)
  assigneeId?: number | null;
  @ApiPropertyOptional({
    nullable: true,
    type: String,
    format: 'date',
    example: '2026-12-18',
    description: 'A calendar day, YYYY-MM-DD; null to clear; absent to keep',
  })
  @ValidateIf((o: AssignDto) => o.dueDate !== null && o.dueDate !== undefined)
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'dueDate must be a day written YYYY-MM-DD' })
  @IsISO8601({ strict: true }, { message: 'dueDate must be a day of the calendar' })
  dueDate?: string | null;
  @ApiPropertyOptional({
    description: 'The version the checker saw; when the item has changed since, 409 with its current status',
  })
  @IsOptional()
  @IsInt()
  @Min(0)
  version?: number;
}

export class TransitionDto {
  @ApiProperty({
    enum: ['answered', 'accepted', 'returned', 'waived'],
    description: 'returned from accepted or waived is the reopen move',
  })
  @IsIn(['answered', 'accepted', 'returned', 'waived'])
  to: DiscrepancyStatus;
  @ApiPropertyOptional({
    description: 'answered: a note or a revision; returned, waived and reopen: the reason',
  })
  @IsOptional()
  @IsString()
  @Length(1, 4000)
  note?: string;
  @ApiPropertyOptional({ description: 'answered: the submittal that revises this discrepancy’s submittal' })
  @IsOptional()
  @IsInt()
  @Min(1)
  revisionSubmittalId?: number;
  @ApiPropertyOptional({
    description: 'The version the mover saw; when the item has changed since, 409 with its current status',
  })
  @IsOptional()
  @IsInt()
  @Min(0)
  version?: number;
}

export class BulkTransitionDto {
  @ApiProperty({ type: [Number] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(500)
  @IsInt({ each: true })
  @Min(1, { each: true })
  ids: number[];
  @ApiProperty({ enum: BULK_TARGETS })
  @IsIn(BULK_TARGETS)
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
