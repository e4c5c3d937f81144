import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  IsEmail,
  IsInt,
  IsNotEmpty,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateBy,
  ValidateIf,
} from 'class-validator';
import { PASSWORD_MAX_LENGTH } from '@tallyloom/core';

/** An e-mail address, trimmed and lower-cased, at most 254 characters (RFC 5321 path limit). */
export const EmailField = () =>
  applyDecorators(
    ApiProperty({ example: 'lead.alderfalls@emberfold.example', maxLength: 254 }),
    Transform(({ value }: { value: unknown }) =>
      typeof value === 'string' ? value.trim().toLowerCase() : value,
    ),
    IsString({ message: '$property must be text' }),
    MaxLength(254, { message: '$property must be at most 254 characters' }),
    IsEmail({}, { message: '$property must be an e-mail address' }),
  );

/**
 * A password as typed: never trimmed (spaces count). Length rules beyond "not empty" and the
 * hard ceiling are the password policy's, which answers with its own plain messages.
 */
export const PasswordField = () =>
  applyDecorators(
    ApiProperty({ format: 'password', maxLength: PASSWORD_MAX_LENGTH }),
    IsString({ message: '$property must be text' }),
    IsNotEmpty({ message: '$property is required' }),
    MaxLength(PASSWORD_MAX_LENGTH * 4, {
      message: `$property must be at most ${PASSWORD_MAX_LENGTH} characters`,
    }),
  );

/** A short free-text field, trimmed, required, with a length ceiling. */
export const TextField = (maxLength: number, example?: string) =>
  applyDecorators(
    ApiProperty({ maxLength, example }),
    Transform(({ value }: { value: unknown }) =>
      typeof value === 'string' ? value.trim() : value,
    ),
    IsString({ message: '$property must be text' }),
    IsNotEmpty({ message: '$property is required' }),
    MaxLength(maxLength, { message: `$property must be at most ${maxLength} characters` }),
  );

export const OptionalTextField = (maxLength: number, example?: string) =>
  applyDecorators(
    ApiPropertyOptional({ maxLength, example }),
    IsOptional(),
    Transform(({ value }: { value: unknown }) =>
      typeof value === 'string' ? value.trim() : value,
    ),
    IsString({ message: '$property must be text' }),
    IsNotEmpty({ message: '$property must not be empty' }),
    MaxLength(maxLength, { message: `$property must be at most ${maxLength} characters` }),
  );

/** Optional free text: trimmed; empty becomes null, so a blank form field means "none". */
export const NullableTextField = (maxLength: number, example?: string, description?: string) =>
  applyDecorators(
    ApiPropertyOptional({ type: String, nullable: true, maxLength, example, description }),
    Transform(({ value }: { value: unknown }) => {
      if (typeof value !== 'string') return value;
      const trimmed = value.trim();
      return trimmed === '' ? null : trimmed;
    }),
    IsOptional(),
    IsString({ message: '$property must be text' }),
    MaxLength(maxLength, { message: `$property must be at most ${maxLength} characters` }),
  );

/** An opaque token from an e-mailed link. */
export const TokenField = () =>
  applyDecorators(
    ApiProperty(),
    IsString({ message: '$property must be text' }),
    IsNotEmpty({ message: '$property is required' }),
    MaxLength(200, { message: '$property is too long' }),
  );

/**
 * Whether a field must be sent: `optional` fields may be left out but never sent as null (a
 * null would reach a NOT NULL column); `nullable` fields may be left out or sent as null.
 */
export type Presence = 'required' | 'optional' | 'nullable';

export interface FieldOptions {
  presence?: Presence;
  example?: unknown;
  description?: string;
}

function presenceDecorators(presence: Presence): PropertyDecorator[] {
  switch (presence) {
    case 'required':
      return [];
    case 'optional':
      return [ValidateIf((_: unknown, value: unknown) => value !== undefined)];
    case 'nullable':
      return [ValidateIf((_: unknown, value: unknown) => value !== null && value !== undefined)];
  }
}

function documented(options: FieldOptions, extra: Record<string, unknown>): PropertyDecorator {
  const presence = options.presence ?? 'required';
  const common = {
    example: options.example,
    description: options.description,
    ...extra,
    ...(presence === 'nullable' ? { nullable: true } : {}),
  };
  return presence === 'required' ? ApiProperty(common) : ApiPropertyOptional(common);
}

const formatBound = (value: number) => value.toLocaleString('en-US');

/**
 * A whole number from `min` to `max` (one message for every way to miss). `query: true` converts
 * a query-string value first; JSON bodies are never converted, so "5" stays text and is refused.
 */
export const WholeNumberField = (
  min: number,
  max: number,
  options: FieldOptions & { query?: boolean } = {},
) => {
  const message = `$property must be a whole number from ${formatBound(min)} to ${formatBound(max)}`;
  return applyDecorators(
    documented(options, { type: 'integer', minimum: min, maximum: max }),
    ...(options.query ? [Type(() => Number)] : []),
    ...presenceDecorators(options.presence ?? 'required'),
    IsInt({ message }),
    Min(min, { message }),
    Max(max, { message }),
  );
};

/** True for a real calendar day written YYYY-MM-DD (no time, no 31 April), years 1900–2999. */
export function isCalendarDate(value: unknown): value is string {
  if (typeof value !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(value)) return false;
  const [year, month, day] = value.split('-').map(Number);
  if (year < 1900 || year > 2999) return false;
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

/** A calendar date as YYYY-MM-DD, the form the API uses for every date without a time. */
export const IsoDateField = (options: FieldOptions = {}) =>
  applyDecorators(
    documented(options, { type: String, format: 'date' }),
    ...presenceDecorators(options.presence ?? 'required'),
    ValidateBy(
      { name: 'isCalendarDate', validator: { validate: (value) => isCalendarDate(value) } },
      { message: '$property must be a date written as YYYY-MM-DD' },
    ),
  );
