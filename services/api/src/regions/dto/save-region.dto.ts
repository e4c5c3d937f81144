import { PartialType } from '@nestjs/swagger';
import type { SaveRegionRequest } from '@tallyloom/core';
import { Transform } from 'class-transformer';
import { IsString, Matches } from 'class-validator';
import { ApiProperty } from '@nestjs/swagger';
import { TextField } from '../../common/validation/fields';

export class SaveRegionDto implements SaveRegionRequest {
  @TextField(80, 'North Ridge')
  name: string;

  @ApiProperty({
    example: 'NR',
    pattern: '^[A-Z0-9]{1,8}$',
    description: 'Short code for exports and URLs; trimmed and upper-cased',
  })
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? value.trim().toUpperCase() : value,
  )
  @Matches(/^[A-Z0-9]{1,8}$/, { message: 'code must be 1 to 8 letters A–Z or digits' })
  @IsString({ message: 'code must be text' })
  code: string;
}

/** A change to a region: only the fields sent change. */
export class UpdateRegionDto
  extends PartialType(SaveRegionDto, { skipNullProperties: false })
  implements Partial<SaveRegionRequest> {}
