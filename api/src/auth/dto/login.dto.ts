import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, Length } from 'class-validator';
import { UserDto } from '../../users/dto/user.dto.js';

export class LoginDto {
  @ApiProperty({ example: 'priya@fennick-ode.example.test' }) @IsEmail() email: string;
  @ApiProperty({ example: 'lantern-demo-2026' }) @IsString() @Length(1, 200) password: string;
}

export class LoginResponseDto {
  @ApiProperty({ description: 'Send as `Authorization: Bearer <accessToken>`' }) accessToken: string;
  @ApiProperty({ example: '15m', description: 'Lifetime of the access token' }) expiresIn: string;
  @ApiProperty({ type: UserDto }) user: UserDto;
}

export class MeDto extends UserDto {
  @ApiProperty({ description: 'How this call was authenticated', enum: ['password', 'api-token'] }) via:
    'password' | 'api-token';
  @ApiProperty({ nullable: true, type: Number, description: 'For API tokens: the one project it may use' })
  tokenProjectId: number | null;
}
