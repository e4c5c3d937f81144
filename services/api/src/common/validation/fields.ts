import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsNotEmpty, IsOptional, IsString, MaxLength } from 'class-validator';
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

/** An opaque token from an e-mailed link. */
export const TokenField = () =>
  applyDecorators(
    ApiProperty(),
    IsString({ message: '$property must be text' }),
    IsNotEmpty({ message: '$property is required' }),
    MaxLength(200, { message: '$property is too long' }),
  );
