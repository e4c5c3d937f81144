import {
  DomainError,
  sampleSize,
  type SamplePlanRequest,
  type SamplePlanView,
  type SamplePopulation,
} from '@tallyloom/core';
import { invalidField } from '../common/validation/field-errors';

/**
 * The plan for a population of `populationSize` items, with the request as it is kept (the
 * population checked, the adjustment spelled out). `field` prefixes problem names: '' for
 * POST /api/samples/plan, 'plan.' for a draw. Every refusal is a 400 that names its field.
 */
export function planFor(
  request: SamplePlanRequest,
  population: SamplePopulation,
  populationSize: number,
  description: string,
  field = '',
): SamplePlanView {
  if (populationSize === 0) {
    throw invalidField(
      `${field}population`,
      `The population is empty: there are no ${description}. Choose another period or scope.`,
    );
  }
  const kept: SamplePlanRequest = {
    population,
    confidence: request.confidence,
    tolerableRate: request.tolerableRate,
    expectedDeviations: request.expectedDeviations,
    finitePopulationAdjustment: request.finitePopulationAdjustment ?? false,
  };
  try {
    const result = sampleSize({ ...kept, population: populationSize });
    if (kept.expectedDeviations >= result.itemsToDraw) {
      throw new DomainError(
        'expectedDeviations',
        `The expected number of deviations (${kept.expectedDeviations}) must be smaller than ` +
          `the sample (${result.itemsToDraw} items).`,
      );
    }
    return { ...result, population: populationSize, request: kept };
  } catch (error) {
    if (error instanceof DomainError)
      throw invalidField(`${field}${error.argument}`, error.message);
    throw error;
  }
}
