import { useMemo } from 'react';
import { Chart } from '@/components/charts/chart';
import './register-charts';
import { buildComplianceOption, describeCompliance, type ComplianceRow } from './compliance-option';

export function ComplianceChart({ rows }: { rows: ComplianceRow[] }) {
  const option = useMemo(() => buildComplianceOption(rows), [rows]);
  return (
    <Chart
      option={option}
      description={`Reporting compliance. ${rows.map(describeCompliance).join(' ')}`}
      height={Math.max(120, 48 + rows.length * 32)}
    />
  );
}
