import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsNumber, IsOptional, IsString, Matches, Max, Min } from 'class-validator';
import { WholeNumberField } from '../../common/validation/fields';

/** The most any one count of a tally may hold: far above a chapter-month, far below the column. */
export const TALLY_COUNT_CEILING = 10_000_000;
export const VOLUNTEER_HOURS_CEILING = 1_000_000;
export const YARN_CEILING = 1_000_000;

// Inside applyDecorators the first validator listed is checked first, and stopAtFirstError keeps
// that one message: so the type check comes first in each list.

/** A count of a tally: a whole number from 0 (negative and fractional counts are refused). */
export const TallyCountField = (description?: string) =>
  WholeNumberField(0, TALLY_COUNT_CEILING, { description });

/** A row id from another table. */
export const IdField = (options: { query?: boolean; optional?: boolean } = {}) =>
  WholeNumberField(1, 4_294_967_295, {
    query: options.query,
    presence: options.optional ? 'optional' : 'required',
  });

/** The version the client read: every write sends it back (optimistic locking). */
export const VersionField = () =>
  WholeNumberField(1, 4_294_967_295, {
    description: 'The version you read; a newer one on the server answers 409 with it',
  });

const MONTH = /^\d{4}-(0[1-9]|1[0-2])$/;

/** A calendar month as YYYY-MM. */
export const MonthField = (options: { optional?: boolean; description?: string } = {}) =>
  applyDecorators(
    options.optional
      ? ApiPropertyOptional({ type: String, example: '2026-03', description: options.description })
      : ApiProperty({ type: String, example: '2026-03', description: options.description }),
    ...(options.optional ? [IsOptional()] : []),
    IsString({ message: '$property must be a month written as YYYY-MM' }),
    Matches(MONTH, { message: '$property must be a month written as YYYY-MM' }),
  );

/** A number from `min` (0 unless said) to `max` with at most `decimals` decimals. */
export const DecimalField = (
  max: number,
  decimals: number,
  message: string,
  description?: string,
  min = 0,
) =>
  applyDecorators(
    ApiProperty({ minimum: min, maximum: max, description }),
    IsNumber({ allowNaN: false, allowInfinity: false, maxDecimalPlaces: decimals }, { message }),
    Min(min, { message }),
    Max(max, { message }),
  );
