import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { IsInt, IsOptional, IsString, Length, Min } from 'class-validator';
import { UserDto } from '../../users/dto/user.dto.js';

export class CreateProjectDto {
  @ApiProperty({ example: 'Harbour Lantern Footbridge' }) @IsString() @Length(1, 200) name: string;
  @ApiPropertyOptional({ example: 'HLF-2026' }) @IsOptional() @IsString() @Length(1, 60) reference?: string;
  @ApiPropertyOptional() @IsOptional() @IsString() @Length(0, 2000) description?: string;
  @ApiPropertyOptional() @IsOptional() @IsInt() @Min(1) ownerOrganisationId?: number;
}

export class UpdateProjectDto extends PartialType(CreateProjectDto) {}

export class AddMemberDto {
  @ApiProperty() @IsInt() @Min(1) userId: number;
}

export class ProjectOwnerDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
}

export class ProjectDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty({ nullable: true, type: String }) reference: string | null;
  @ApiProperty({ nullable: true, type: String }) description: string | null;
  @ApiProperty({ type: ProjectOwnerDto, nullable: true }) ownerOrganisation: ProjectOwnerDto | null;
  @ApiProperty() submittalCount: number;
  @ApiProperty({ description: 'Discrepancies in raised, answered or returned' }) openDiscrepancyCount: number;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

export class ProjectMemberDto extends UserDto {
  @ApiProperty({ format: 'date-time' }) memberSince: string;
}
