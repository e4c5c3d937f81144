import type { ListSamplesParams } from '@tallyloom/core';
import { WholeNumberField } from '../../common/validation/fields';

export class ListSamplesQuery implements ListSamplesParams {
  @WholeNumberField(1, 100000, { presence: 'optional', query: true, example: 1 }) page?: number;
  @WholeNumberField(1, 100, { presence: 'optional', query: true, example: 25 }) pageSize?: number;
}
