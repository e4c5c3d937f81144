import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import type { BlanketSizeView, SaveBlanketSizeRequest } from '@tallyloom/core';
import { Transform } from 'class-transformer';
import { IsBoolean, IsOptional, IsString, MaxLength, ValidateIf } from 'class-validator';
import { TextField, WholeNumberField } from '../../common/validation/fields';

export class BlanketSizeDto implements BlanketSizeView {
  @ApiProperty({ example: 4 }) id: number;
  @ApiProperty({ example: 'Adult throw' }) name: string;
  @ApiProperty({ example: 7, description: 'Panels across' }) columns: number;
  @ApiProperty({ example: 7, description: 'Panels down' }) rows: number;
  @ApiProperty({ example: 49, description: 'columns × rows' }) panels: number;
  @ApiProperty({ example: 49, description: 'Finished width, inches (2 decimals)' }) widthIn: number;
  @ApiProperty({ example: 63 }) heightIn: number;
  @ApiProperty({ example: 124.46, description: 'Finished width, cm (2 decimals)' })
  widthCm: number;
  @ApiProperty({ example: 160.02 }) heightCm: number;
  @ApiProperty() active: boolean;
  @ApiProperty({ example: 4 }) sortOrder: number;
  @ApiProperty({ nullable: true, type: String }) sourceNote: string | null;
}

export class SaveBlanketSizeDto implements SaveBlanketSizeRequest {
  @TextField(60, 'Adult throw')
  name: string;

  @WholeNumberField(1, 20, { example: 7, description: 'Panels across' })
  columns: number;

  @WholeNumberField(1, 20, { example: 7, description: 'Panels down' })
  rows: number;

  @ApiPropertyOptional({ default: true })
  @ValidateIf((_, value) => value !== undefined)
  @IsBoolean({ message: 'active must be true or false' })
  active?: boolean;

  @WholeNumberField(0, 9999, {
    presence: 'optional',
    example: 4,
    description: 'Place in lists; smaller first',
  })
  sortOrder?: number;

  @ApiPropertyOptional({ nullable: true, type: String, maxLength: 255 })
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? value.trim() || null : value,
  )
  @ValidateIf((_, value) => value !== null && value !== undefined)
  @IsString({ message: 'sourceNote must be text' })
  @MaxLength(255, { message: 'sourceNote must be at most 255 characters' })
  sourceNote?: string | null;
}

/** A change to a catalogue entry: only the fields sent change. */
export class UpdateBlanketSizeDto
  extends PartialType(SaveBlanketSizeDto, { skipNullProperties: false })
  implements Partial<SaveBlanketSizeRequest> {}

export class ListBlanketSizesQuery {
  @ApiPropertyOptional({
    type: Boolean,
    description: 'Network admins only: also list retired sizes. Ignored for other roles.',
  })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) =>
    value === 'true' ? true : value === 'false' ? false : value,
  )
  @IsBoolean({ message: 'includeInactive must be true or false' })
  includeInactive?: boolean;
}
