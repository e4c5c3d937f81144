import type { DashboardParams, ImpactPackRequest, ImpactPackScope } from '@tallyloom/core';

/** What the form holds; ids stay undefined until chosen. */
export interface ImpactPackChoice {
  scope: ImpactPackScope;
  regionId?: number;
  campaignId?: number;
  period: DashboardParams;
}

export type ImpactPackProblems = Partial<Record<'regionId' | 'campaignId', string>>;

/** A regional or campaign pack needs its region or campaign; the network needs nothing more. */
export function impactPackProblems(choice: ImpactPackChoice): ImpactPackProblems {
  if (choice.scope === 'region' && choice.regionId === undefined) {
    return { regionId: 'Choose the region the pack is for.' };
  }
  if (choice.scope === 'campaign' && choice.campaignId === undefined) {
    return { campaignId: 'Choose the campaign the pack is for.' };
  }
  return {};
}

/** The request as the API reads it: scope, its id when it has one, and the period's own fields. */
export function impactPackRequest(choice: ImpactPackChoice): ImpactPackRequest {
  const { period } = choice;
  const periodFields: DashboardParams =
    period.periodKind === 'custom'
      ? { periodKind: 'custom', from: period.from, to: period.to }
      : { periodKind: period.periodKind, period: period.period };
  const scopeId =
    choice.scope === 'region'
      ? choice.regionId
      : choice.scope === 'campaign'
        ? choice.campaignId
        : undefined;
  return {
    scope: choice.scope,
    ...(scopeId === undefined ? {} : { scopeId }),
    ...periodFields,
  };
}

/** The fiscal year that ends this calendar year: the one the dashboards' picker starts on too. */
export function defaultImpactPackPeriod(today: string): DashboardParams {
  return { periodKind: 'fiscal_year', period: `FY${today.slice(0, 4)}` };
}
