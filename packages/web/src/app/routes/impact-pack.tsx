import { PageHeader } from '@/components/ui/page-header';
import { PeriodPicker } from '@/features/dashboards/components/period-picker';
import { ImpactPackBuilder } from '@/features/impact-pack/components/impact-pack-builder';
import { defaultImpactPackPeriod } from '@/features/impact-pack/impact-pack-request';
import { useRegions } from '@/features/network/api/get-regions';
import { useCampaigns } from '@/features/receipts/api/get-campaigns';
import { todayIsoDate } from '@/lib/format';

/** The grant writer's workbook for a scope and period. Loaded on demand. */
export function ImpactPackRoute() {
  const regions = useRegions();
  const campaigns = useCampaigns();
  return (
    <>
      <PageHeader
        title="Impact pack"
        description="One workbook of the network's figures for a period, ready for a funding application."
      />
      <ImpactPackBuilder
        regions={regions.data ?? []}
        campaigns={campaigns.data ?? []}
        optionsPending={regions.isPending || campaigns.isPending}
        initialPeriod={defaultImpactPackPeriod(todayIsoDate())}
        renderPeriodPicker={(value, onChange) => <PeriodPicker value={value} onChange={onChange} />}
      />
    </>
  );
}
