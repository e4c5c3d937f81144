import { Button, Field, makeStyles, Radio, RadioGroup, tokens } from '@fluentui/react-components';
import { DocumentTable20Regular } from '@fluentui/react-icons';
import type { CampaignView, DashboardParams, ImpactPackScope, RegionView } from '@tallyloom/core';
import { useState, type FormEvent, type ReactNode } from 'react';
import { SectionHeading } from '@/components/ui/section-heading';
import { useCreateImpactPack } from '@/features/exports/api/create-impact-pack';
import { ExportProgressDialog } from '@/features/exports/components/export-progress-dialog';
import {
  impactPackProblems,
  impactPackRequest,
  type ImpactPackChoice,
  type ImpactPackProblems,
} from '../impact-pack-request';
import { PackContents } from './pack-contents';
import { ScopeSelect } from './scope-select';

const useStyles = makeStyles({
  layout: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalXXXL,
    alignItems: 'flex-start',
  },
  form: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
    minWidth: '320px',
    maxWidth: '480px',
  },
  picker: { maxWidth: '320px' },
  actions: { marginTop: tokens.spacingVerticalS },
});

const SCOPE_LABELS: Record<ImpactPackScope, string> = {
  network: 'Whole network',
  region: 'A region',
  campaign: 'A campaign',
};

export interface ImpactPackBuilderProps {
  regions: RegionView[];
  campaigns: CampaignView[];
  /** The region and campaign lists are still loading. */
  optionsPending?: boolean;
  initialPeriod: DashboardParams;
  /** The dashboards' period picker, handed in by the route (features do not import each other). */
  renderPeriodPicker: (
    value: DashboardParams,
    onChange: (next: DashboardParams) => void,
  ) => ReactNode;
}

/** Choose a scope and a period, build the workbook in the background, then download it. */
export function ImpactPackBuilder({
  regions,
  campaigns,
  optionsPending = false,
  initialPeriod,
  renderPeriodPicker,
}: ImpactPackBuilderProps) {
  const styles = useStyles();
  const create = useCreateImpactPack();
  const [choice, setChoice] = useState<ImpactPackChoice>({
    scope: 'network',
    period: initialPeriod,
  });
  const [problems, setProblems] = useState<ImpactPackProblems>({});
  const [dialogOpen, setDialogOpen] = useState(false);

  const change = (next: Partial<ImpactPackChoice>) => {
    const updated = { ...choice, ...next };
    setChoice(updated);
    // Once a problem is shown, it clears as soon as it is fixed.
    if (Object.keys(problems).length) setProblems(impactPackProblems(updated));
  };

  const build = () => {
    setDialogOpen(true);
    create.mutate(impactPackRequest(choice));
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = impactPackProblems(choice);
    setProblems(found);
    if (Object.keys(found).length === 0) build();
  };

  return (
    <div className={styles.layout}>
      <form className={styles.form} onSubmit={submit} noValidate aria-labelledby="impact-pack-form">
        <SectionHeading id="impact-pack-form">Scope and period</SectionHeading>
        <Field label="Scope">
          <RadioGroup
            value={choice.scope}
            onChange={(_event, data) => change({ scope: data.value as ImpactPackScope })}
          >
            {(Object.keys(SCOPE_LABELS) as ImpactPackScope[]).map((scope) => (
              <Radio key={scope} value={scope} label={SCOPE_LABELS[scope]} />
            ))}
          </RadioGroup>
        </Field>
        {choice.scope === 'region' ? (
          <ScopeSelect
            label="Region"
            value={choice.regionId}
            options={regions.map((region) => ({ id: region.id, label: region.name }))}
            pending={optionsPending}
            problem={problems.regionId}
            className={styles.picker}
            onChange={(regionId) => change({ regionId })}
          />
        ) : null}
        {choice.scope === 'campaign' ? (
          <ScopeSelect
            label="Campaign"
            value={choice.campaignId}
            options={campaigns.map((campaign) => ({
              id: campaign.id,
              label: `${campaign.name} (${campaign.code})`,
            }))}
            pending={optionsPending}
            problem={problems.campaignId}
            className={styles.picker}
            onChange={(campaignId) => change({ campaignId })}
          />
        ) : null}
        {renderPeriodPicker(choice.period, (period) => change({ period }))}
        <div className={styles.actions}>
          <Button
            type="submit"
            appearance="primary"
            icon={<DocumentTable20Regular />}
            disabledFocusable={create.isPending}
          >
            {create.isPending ? 'Asking for the pack…' : 'Build impact pack'}
          </Button>
        </div>
      </form>
      <PackContents headingId="impact-pack-contents" />
      <ExportProgressDialog
        open={dialogOpen}
        title="Impact pack"
        exportId={create.data?.id}
        requesting={create.isPending}
        requestError={create.error ?? undefined}
        onRetry={build}
        onClose={() => setDialogOpen(false)}
      />
    </div>
  );
}
