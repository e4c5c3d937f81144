import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import {
  WORKSHEET_RESULTS,
  type WorksheetEntryRequest,
  type WorksheetResult,
} from '@tallyloom/core';
import { NullableTextField } from '../../common/validation/fields';

/** JSON, or multipart form fields beside an optional `attachment` file. */
export class WorksheetEntryDto implements WorksheetEntryRequest {
  @ApiProperty({ enum: WORKSHEET_RESULTS })
  @IsIn(WORKSHEET_RESULTS, { message: `$property must be one of: ${WORKSHEET_RESULTS.join(', ')}` })
  result: WorksheetResult;

  @NullableTextField(
    2000,
    'Label says 40 panels; the tally counted 48.',
    'Required for a deviation',
  )
  // A blank note arrives as null (no note), which the service treats as left out.
  note?: string;
}
