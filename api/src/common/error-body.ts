import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

/** The one error shape every route answers with. */
export class ErrorBody {
  @ApiProperty({ example: 422 }) statusCode: number;
  @ApiProperty({ example: 'Unprocessable Entity' }) error: string;
  @ApiProperty({ example: '2 of 10 files are invalid; nothing was stored.' }) message: string;
  @ApiPropertyOptional({
    description:
      'Itemised problems: CalcError[] for 422 uploads, {property, constraints} for 400 validation.',
    type: 'array',
    items: { type: 'object', additionalProperties: true },
  })
  details?: unknown[];
}
