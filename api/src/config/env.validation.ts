import { plainToInstance } from 'class-transformer';
import {
  IsBooleanString,
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  Max,
  Min,
  MinLength,
  validateSync,
} from 'class-validator';
import { Type } from 'class-transformer';
import { DEMO_JWT_SECRET } from './auth.config.js';

/** Every environment variable the service reads. All optional: the defaults run the demo. */
export class EnvironmentVariables {
  @IsOptional() @Type(() => Number) @IsInt() @Min(0) @Max(65535) PORT?: number;
  @IsOptional() @IsString() HOST?: string;
  @IsOptional() @IsString() LIGAMENT_DB?: string;
  @IsOptional() @Type(() => Number) @IsInt() @Min(0) LIGAMENT_DB_BUSY_TIMEOUT_MS?: number;
  @IsOptional() @IsString() LIGAMENT_WEB_DIST?: string;
  @IsOptional() @IsString() LIGAMENT_PUBLIC_URL?: string;
  @IsOptional() @IsBooleanString() LIGAMENT_DEMO?: string;
  @IsOptional() @IsString() @MinLength(16) JWT_SECRET?: string;
  @IsOptional() @IsString() JWT_EXPIRES_IN?: string;
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) INVITE_TTL_HOURS?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) SESSION_IDLE_HOURS?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) SESSION_MAX_DAYS?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(0) @Max(300) REFRESH_RACE_GRACE_SECONDS?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) UPLOAD_MAX_FILE_BYTES?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) UPLOAD_MAX_FILES?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) UPLOAD_MAX_TOTAL_BYTES?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) THROTTLE_TTL_MS?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) THROTTLE_LIMIT?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) LOGIN_THROTTLE_TTL_MS?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) LOGIN_THROTTLE_LIMIT?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) LOGIN_ACCOUNT_THROTTLE_LIMIT?: number;
  @IsOptional() @IsString() SMTP_HOST?: string;
  @IsOptional() @Type(() => Number) @IsInt() @Min(0) @Max(65535) SMTP_PORT?: number;
  @IsOptional() @IsString() MAIL_FROM?: string;
  @IsOptional() @IsBooleanString() SMTP_FAKE?: string;
  @IsOptional() @Type(() => Number) @IsInt() @Min(0) @Max(65535) SMTP_FAKE_PORT?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(0) MAIL_RETRY_INTERVAL_MS?: number;
  @IsOptional() @Type(() => Number) @IsInt() @Min(0) MAIL_RETRY_BASE_MS?: number;
  @IsOptional() @IsIn(['error', 'warn', 'log', 'debug']) LOG_LEVEL?: string;
}

/**
 * Outside demo mode the service must have its own signing secret: with the public demo secret anyone
 * can forge a sign-in for any account. Demo mode keeps the default (and health reports it).
 */
function secretProblem(config: Record<string, unknown>): string | null {
  const demo =
    config.LIGAMENT_DEMO === undefined || config.LIGAMENT_DEMO === '' || config.LIGAMENT_DEMO === 'true';
  if (demo) return null;
  const secret = typeof config.JWT_SECRET === 'string' ? config.JWT_SECRET : '';
  if (secret === '')
    return 'required when LIGAMENT_DEMO=false: set 16+ random characters (e.g. the output of `openssl rand -base64 32`); without it sign-ins would be signed with the public demo secret';
  if (secret === DEMO_JWT_SECRET)
    return 'is the public demo secret, which anyone can use to forge sign-ins; set your own (16+ random characters) when LIGAMENT_DEMO=false';
  return null;
}

/** ConfigModule `validate`: rejects a bad environment at start-up with every problem listed. */
export function validateEnvironment(config: Record<string, unknown>): Record<string, unknown> {
  const parsed = plainToInstance(EnvironmentVariables, config, { enableImplicitConversion: false });
  const errors = validateSync(parsed, { skipMissingProperties: false, forbidUnknownValues: false });
  const lines = errors.map((e) => `  ${e.property}: ${Object.values(e.constraints ?? {}).join('; ')}`);
  const secret = secretProblem(config);
  if (secret) lines.push(`  JWT_SECRET: ${secret}`);
  if (lines.length > 0) {
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  return config;
}

/** The start-up check main.ts runs before it builds the app: the problem as text, or null. */
export function environmentProblem(): string | null {
  try {
    validateEnvironment(process.env);
    return null;
  } catch (error) {
    return error instanceof Error ? error.message : String(error);
  }
}
