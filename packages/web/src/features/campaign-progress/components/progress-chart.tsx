import { useMemo } from 'react';
import { Chart } from '@/components/charts/chart';
import { buildProgressOption, describeProgress, type ProgressInput } from './progress-option';
import './register-charts';

/** Credited panels week by week against the goal, with the projection when there is one. */
export function ProgressChart(input: ProgressInput) {
  const { goalPanels, startsOn, endsOn, weekly, creditedPanels, projection } = input;
  const option = useMemo(
    () => buildProgressOption({ goalPanels, startsOn, endsOn, weekly, creditedPanels, projection }),
    [goalPanels, startsOn, endsOn, weekly, creditedPanels, projection],
  );
  return <Chart option={option} description={describeProgress(input)} height={300} />;
}
