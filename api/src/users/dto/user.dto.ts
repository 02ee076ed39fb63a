import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsEmail, IsEnum, IsInt, IsOptional, IsString, Length, Min } from 'class-validator';
import { Role } from '../../auth/role.enum.js';

export class UserOrganisationDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
}

export class UserDto {
  @ApiProperty() id: number;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: Role, enumName: 'Role' }) role: Role;
  @ApiProperty({ nullable: true, type: Number }) organisationId: number | null;
  @ApiProperty({ type: UserOrganisationDto, nullable: true }) organisation: UserOrganisationDto | null;
  @ApiProperty() active: boolean;
}

export class UpdateUserDto {
  @ApiPropertyOptional({ enum: Role, enumName: 'Role' }) @IsOptional() @IsEnum(Role) role?: Role;
  @ApiPropertyOptional() @IsOptional() @IsBoolean() active?: boolean;
  @ApiPropertyOptional() @IsOptional() @IsString() @Length(1, 200) name?: string;
  @ApiPropertyOptional() @IsOptional() @IsInt() @Min(1) organisationId?: number;
}

export class CreateInvitationDto {
  @ApiProperty({ example: 'new.engineer@fennick-ode.example.test' }) @IsEmail() email: string;
  @ApiProperty({ example: 'Noor Castellan' }) @IsString() @Length(1, 200) name: string;
  @ApiProperty({ enum: Role, enumName: 'Role' }) @IsEnum(Role) role: Role;
  @ApiPropertyOptional() @IsOptional() @IsInt() @Min(1) organisationId?: number;
}

export const INVITATION_STATES = ['waiting', 'accepted', 'expired', 'revoked', 'replaced'] as const;
export type InvitationState = (typeof INVITATION_STATES)[number];

export class InvitationDto {
  @ApiProperty() id: number;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: Role, enumName: 'Role' }) role: Role;
  @ApiProperty({ nullable: true, type: Number }) organisationId: number | null;
  @ApiProperty({
    enum: INVITATION_STATES,
    description:
      'waiting (the link works), accepted, expired, revoked by an admin, or replaced by a resent invitation',
  })
  state: InvitationState;
  @ApiProperty({ format: 'date-time' }) expiresAt: string;
  @ApiProperty({ format: 'date-time', nullable: true, type: String }) acceptedAt: string | null;
  @ApiProperty({ format: 'date-time', nullable: true, type: String }) revokedAt: string | null;
  @ApiProperty({ nullable: true, type: Number, description: 'The invitation that replaced this one' })
  replacedById: number | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

/** What the invitee sees before setting a password (GET /api/invitations/:token). */
export class InvitationPreviewDto {
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: Role, enumName: 'Role' }) role: Role;
  @ApiProperty({ nullable: true, type: String }) organisation: string | null;
  @ApiProperty({ format: 'date-time' }) expiresAt: string;
}

export class AcceptInvitationDto {
  @ApiProperty({ minLength: 10, maxLength: 200 }) @IsString() @Length(10, 200) password: string;
  @ApiPropertyOptional({ description: 'Change the name the admin typed' })
  @IsOptional()
  @IsString()
  @Length(1, 200)
  name?: string;
}
