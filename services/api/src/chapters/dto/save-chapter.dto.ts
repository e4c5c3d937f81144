import { PartialType } from '@nestjs/swagger';
import type { SaveChapterRequest } from '@tallyloom/core';
import { IsoDateField, TextField, WholeNumberField } from '../../common/validation/fields';

export class SaveChapterDto implements SaveChapterRequest {
  @TextField(80, 'Alder Falls')
  name: string;

  @WholeNumberField(1, 4294967295, { example: 7 })
  regionId: number;

  @WholeNumberField(1, 28, {
    example: 10,
    description: 'Day of the following month by which the monthly tally is due',
  })
  reportingDueDay: number;

  @IsoDateField({ example: '2022-09-01' })
  activeFrom: string;

  @IsoDateField({
    presence: 'nullable',
    example: null,
    description: 'The day the chapter closed; on or after activeFrom. Null while active.',
  })
  activeTo?: string | null;
}

/** A change to a chapter: only the fields sent change; `activeTo: null` reopens it. */
export class UpdateChapterDto
  extends PartialType(SaveChapterDto, { skipNullProperties: false })
  implements Partial<SaveChapterRequest> {}
