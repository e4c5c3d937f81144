import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { formatDate, formatDateTime } from '@/lib/format';
import { usePublicCampaignProgress } from '../api/get-public-campaign-progress';
import { CampaignFigures } from './campaign-figures';
import { ProgressChart } from './progress-chart';

const useStyles = makeStyles({
  note: { margin: 0, marginBottom: tokens.spacingVerticalL, color: tokens.colorNeutralForeground2 },
  chart: { marginTop: tokens.spacingVerticalXL },
});

/** The read-only page a campaign shares: counts only, nothing about people, no sign-in. */
export function PublicProgress({ code }: { code: string }) {
  const styles = useStyles();
  const progress = usePublicCampaignProgress(code);
  if (progress.isPending) return <LoadingState label="Loading the campaign’s progress…" />;
  if (progress.isError) {
    return (
      <>
        <PageHeader title="Campaign progress" />
        <ErrorState
          title="This campaign’s progress could not be loaded"
          error={progress.error}
          onRetry={() => void progress.refetch()}
          retrying={progress.isFetching}
        />
      </>
    );
  }
  const data = progress.data;
  return (
    <>
      <PageHeader title={data.name} description="Campaign progress" />
      <Text as="p" className={styles.note}>
        {formatDate(data.startsOn)} to {formatDate(data.endsOn)}. As of {formatDateTime(data.asOf)}.
        Figures are estimates built from volunteer reports.
      </Text>
      <CampaignFigures progress={data} />
      <div className={styles.chart}>
        <ProgressChart {...data} />
      </div>
    </>
  );
}
