import { ApiProperty } from '@nestjs/swagger';
import type { NetworkSettings } from '@tallyloom/core';
import { IsNumber, Max, Min } from 'class-validator';
import { WholeNumberField } from '../../common/validation/fields';

const TOLERANCE =
  'panelToleranceIn must be a number of inches from 0 to 3, with at most 2 decimals';

const SERVED_FACTOR =
  'servedPerBlanketWarnFactor must be a number from 1 to 100, with at most 1 decimal';

/** The network's settings, read and written whole. */
export class NetworkSettingsDto implements NetworkSettings {
  @WholeNumberField(1, 12, {
    example: 7,
    description: 'Month the fiscal year starts: 1 = January … 12 = December',
  })
  fiscalYearStartMonth: number;

  @ApiProperty({
    example: 0.5,
    minimum: 0,
    maximum: 3,
    description: 'Allowed difference of a measured panel from 7 × 9 in, in inches',
  })
  @Max(3, { message: TOLERANCE })
  @Min(0, { message: TOLERANCE })
  @IsNumber({ allowNaN: false, allowInfinity: false, maxDecimalPlaces: 2 }, { message: TOLERANCE })
  panelToleranceIn: number;

  @WholeNumberField(1, 1_000_000, {
    example: 10000,
    description: 'A count above this on one receipt is refused as implausible',
  })
  receiptCountCeiling: number;

  @ApiProperty({
    example: 3,
    minimum: 1,
    maximum: 100,
    description: 'A tally warns when people served exceed blankets given × this factor',
  })
  @Max(100, { message: SERVED_FACTOR })
  @Min(1, { message: SERVED_FACTOR })
  @IsNumber(
    { allowNaN: false, allowInfinity: false, maxDecimalPlaces: 1 },
    { message: SERVED_FACTOR },
  )
  servedPerBlanketWarnFactor: number;

  @WholeNumberField(1, 28, {
    example: 3,
    description:
      'Days before the due day that leads of a chapter with a missing tally are reminded',
  })
  reminderDaysBeforeDue: number;

  @WholeNumberField(1, 28, {
    example: 2,
    description: 'Days after the due day that leads of a chapter with a missing tally are reminded',
  })
  reminderDaysAfterDue: number;
}
