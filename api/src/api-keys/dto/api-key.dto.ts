import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayNotEmpty,
  ArrayUnique,
  IsArray,
  IsIn,
  IsInt,
  IsISO8601,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  MinLength,
} from 'class-validator';
import { API_KEY_SCOPES, ApiKeyScope } from '../api-key-scopes';

export const API_KEY_STATUSES = ['active', 'retiring', 'rotated-out', 'expired', 'revoked'] as const;
export type ApiKeyStatus = (typeof API_KEY_STATUSES)[number];

export class ApiKeyDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'settlement-forecast job (invented)' })
  name: string;

  @ApiProperty({ description: 'The visible start of the key, enough to recognise it.', example: 'llsq1_7k2m9x4r8t3v_…' })
  prefix: string;

  @ApiProperty({ enum: API_KEY_SCOPES, isArray: true })
  scopes: ApiKeyScope[];

  @ApiProperty({
    enum: API_KEY_STATUSES,
    description: 'retiring: rotated, still accepted until retiresAt; rotated-out, expired and revoked keys are refused.',
  })
  status: ApiKeyStatus;

  @ApiProperty({ type: String, nullable: true, format: 'uuid' })
  createdByUserId: string | null;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: String, nullable: true, format: 'date-time' })
  expiresAt: string | null;

  @ApiProperty({ type: String, nullable: true, format: 'date-time', description: 'Up to about 10 s behind.' })
  lastUsedAt: string | null;

  @ApiProperty({ type: String, nullable: true, example: '203.0.113.7' })
  lastUsedIp: string | null;

  @ApiProperty({ type: String, nullable: true, format: 'date-time' })
  revokedAt: string | null;

  @ApiProperty({ type: String, nullable: true, format: 'date-time', description: 'Set by rotation: the end of the overlap.' })
  retiresAt: string | null;

  @ApiProperty({ type: String, nullable: true, format: 'uuid' })
  replacedByKeyId: string | null;
}

export class ApiKeyListDto {
  @ApiProperty({ type: [ApiKeyDto], description: "Developers see only the keys they created; owners and admins see all." })
  items: ApiKeyDto[];
}

export class CreatedApiKeyDto {
  @ApiProperty({ type: ApiKeyDto })
  apiKey: ApiKeyDto;

  @ApiProperty({
    description: 'The full key. Shown only in this answer: Leastline keeps only a hash of its secret.',
    example: 'llsq1_7k2m9x4r8t3v_…',
  })
  plaintextKey: string;
}

export class CreateApiKeyDto {
  @ApiProperty({ example: 'settlement-forecast job (invented)', minLength: 1, maxLength: 100 })
  @IsString()
  @MinLength(1)
  @MaxLength(100)
  name: string;

  @ApiProperty({ enum: API_KEY_SCOPES, isArray: true, example: ['fits:run', 'datasets:read'] })
  @IsArray()
  @ArrayNotEmpty({ message: 'scopes must list at least one scope' })
  @ArrayUnique({ message: 'scopes must not repeat a scope' })
  @ArrayMaxSize(API_KEY_SCOPES.length)
  @IsIn(API_KEY_SCOPES, { each: true, message: `each scope must be one of: ${API_KEY_SCOPES.join(', ')}` })
  scopes: ApiKeyScope[];

  @ApiPropertyOptional({ format: 'date-time', description: 'When the key stops working; in the future, at most 3 years ahead.' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'expiresAt must be an ISO 8601 date-time' })
  expiresAt?: string;
}

export class RotateApiKeyDto {
  @ApiPropertyOptional({
    minimum: 0,
    maximum: 168,
    default: 24,
    description: 'Hours the old key keeps working next to the new one (0 = it stops at once).',
  })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'overlapHours must be a whole number of hours' })
  @Min(0)
  @Max(168)
  overlapHours?: number;
}
