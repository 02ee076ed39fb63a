import { ApiProperty } from '@nestjs/swagger';

export class EventActorDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty() role: string;
}

export class EventDto {
  @ApiProperty() id: number;
  @ApiProperty({ example: 'discrepancy.answered' }) type: string;
  @ApiProperty({ format: 'date-time' }) at: string;
  @ApiProperty({ type: EventActorDto, nullable: true }) actor: EventActorDto | null;
  @ApiProperty({ nullable: true, type: Number }) projectId: number | null;
  @ApiProperty({ nullable: true, type: Number }) submittalId: number | null;
  @ApiProperty({ nullable: true, type: Number }) discrepancyId: number | null;
  @ApiProperty({ type: 'object', additionalProperties: true }) data: Record<string, unknown>;
}

export class EventPageDto {
  @ApiProperty({ type: [EventDto] }) items: EventDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}
