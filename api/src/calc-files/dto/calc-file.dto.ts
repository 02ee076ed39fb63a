import { ApiProperty } from '@nestjs/swagger';

export class CalcFileDto {
  @ApiProperty() id: number;
  @ApiProperty() submittalId: number;
  @ApiProperty() fileName: string;
  @ApiProperty() size: number;
  @ApiProperty({ description: 'sha256 (hex) of the original bytes' }) sha256: string;
  @ApiProperty({ type: [String] }) memberIds: string[];
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

export class CalcFileDetailDto extends CalcFileDto {
  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description: 'The normalised CalcDocument (ligament package types)',
  })
  document: unknown;
}
