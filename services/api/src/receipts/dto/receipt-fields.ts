import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  IsEmail,
  IsInt,
  IsISO8601,
  IsOptional,
  IsString,
  Matches,
  Max,
  MaxLength,
  Min,
} from 'class-validator';

// Inside applyDecorators the first validator listed is checked first, and stopAtFirstError keeps
// that one message: so the type check comes first in each list.

/** A count of things: a whole number from 0 up (the plausibility ceiling is a setting). */
export const CountField = (description?: string) =>
  applyDecorators(
    ApiProperty({ type: 'integer', minimum: 0, description }),
    IsInt({ message: '$property must be a whole number' }),
    Min(0, { message: '$property must be 0 or more' }),
    Max(4294967295, { message: '$property is implausibly large' }),
  );

/** A row id from another table: a positive whole number. */
export const IdField = (options: { optional?: boolean; description?: string } = {}) =>
  applyDecorators(
    options.optional
      ? ApiPropertyOptional({ type: 'integer', description: options.description })
      : ApiProperty({ type: 'integer', description: options.description }),
    ...(options.optional ? [IsOptional(), Type(() => Number)] : []),
    IsInt({ message: '$property must be a whole number' }),
    Min(1, { message: '$property must be a whole number' }),
    Max(4294967295, { message: '$property must be a whole number' }),
  );

/** A calendar date as YYYY-MM-DD. */
export const DateField = (options: { optional?: boolean; description?: string } = {}) =>
  applyDecorators(
    options.optional
      ? ApiPropertyOptional({ type: String, format: 'date', description: options.description })
      : ApiProperty({ type: String, format: 'date', description: options.description }),
    ...(options.optional ? [IsOptional()] : []),
    IsString({ message: '$property must be a date as YYYY-MM-DD' }),
    Matches(/^\d{4}-\d{2}-\d{2}$/, { message: '$property must be a date as YYYY-MM-DD' }),
    IsISO8601({ strict: true }, { message: '$property must be a real calendar date' }),
  );

/** Optional free text (shared with other features). */
export { NullableTextField } from '../../common/validation/fields';

export const NullableEmailField = () =>
  applyDecorators(
    ApiPropertyOptional({ type: String, nullable: true, maxLength: 254 }),
    Transform(({ value }: { value: unknown }) => {
      if (typeof value !== 'string') return value;
      const trimmed = value.trim().toLowerCase();
      return trimmed === '' ? null : trimmed;
    }),
    IsOptional(),
    IsString({ message: '$property must be text' }),
    MaxLength(254, { message: '$property must be at most 254 characters' }),
    IsEmail({}, { message: '$property must be an e-mail address' }),
  );
