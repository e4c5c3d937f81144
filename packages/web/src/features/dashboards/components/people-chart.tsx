import type { PeopleGroup } from '@tallyloom/core';
import { useMemo } from 'react';
import { Chart } from '@/components/charts/chart';
import './register-charts';
import { buildPeopleOption, describePeople } from './people-option';

export function PeopleChart({ byGroup }: { byGroup: Record<PeopleGroup, number> }) {
  const option = useMemo(() => buildPeopleOption(byGroup), [byGroup]);
  return <Chart option={option} description={describePeople(byGroup)} height={220} />;
}
