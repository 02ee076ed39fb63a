import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Min } from 'class-validator';
import { CountsByClassDto, CountsBySeverityDto } from '../../submittals/dto/submittal.dto.js';

export class DashboardQuery {
  @ApiPropertyOptional({ description: 'Only this project (must be one of yours)' })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  projectId?: number;
}

export class AgeBucketsDto {
  @ApiProperty({ description: '0–7 days' }) week: number;
  @ApiProperty({ description: '8–30 days' }) month: number;
  @ApiProperty({ description: '31–90 days' }) quarter: number;
  @ApiProperty({ description: 'over 90 days' }) older: number;
}

export class DashboardProjectDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty() open: number;
  @ApiProperty() openErrors: number;
  @ApiProperty() submittals: number;
}

export class TrendPointDto {
  @ApiProperty() submittalId: number;
  @ApiProperty() projectId: number;
  @ApiProperty() title: string;
  @ApiProperty({ format: 'date-time' }) date: string;
  @ApiProperty({ description: 'Findings raised by this submittal' }) raised: number;
  @ApiProperty({ description: 'Of those, still open now and not superseded by a later revision' })
  open: number;
  @ApiProperty({ type: CountsBySeverityDto }) bySeverity: CountsBySeverityDto;
}

export class DashboardDto {
  @ApiProperty({ type: [DashboardProjectDto] }) projects: DashboardProjectDto[];
  @ApiProperty({ description: 'Open current items (raised, answered, returned)' }) openTotal: number;
  @ApiProperty({
    description: 'Items a later revision re-checked (carried on or resolved); never counted as open',
  })
  superseded: number;
  @ApiProperty({ type: CountsByClassDto }) openByClass: CountsByClassDto;
  @ApiProperty({ type: CountsBySeverityDto }) openBySeverity: CountsBySeverityDto;
  @ApiProperty({ type: AgeBucketsDto }) openByAge: AgeBucketsDto;
  @ApiProperty({ type: [TrendPointDto], description: 'One point per submittal, by submittal date' })
  trend: TrendPointDto[];
  @ApiProperty({ format: 'date-time' }) generatedAt: string;
}
