import { ApiProperty } from '@nestjs/swagger';
import { IsInt, IsString, Length, Min } from 'class-validator';

export class CreateTokenDto {
  @ApiProperty({ example: 'CI — harbour-lantern repo' }) @IsString() @Length(1, 100) name: string;
  @ApiProperty({ description: 'The one project this token may upload to and read' })
  @IsInt()
  @Min(1)
  projectId: number;
}

export class TokenDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty() projectId: number;
  @ApiProperty({ description: 'First characters, to tell tokens apart', example: 'lgt_3kq9' }) prefix: string;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ format: 'date-time', nullable: true, type: String }) lastUsedAt: string | null;
  @ApiProperty({ format: 'date-time', nullable: true, type: String }) revokedAt: string | null;
}

export class CreatedTokenDto extends TokenDto {
  @ApiProperty({ description: 'The token itself. Shown this once; only its sha256 is stored.' })
  token: string;
}
