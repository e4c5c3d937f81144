import { makeStyles, tokens } from '@fluentui/react-components';
import { PageHeader } from '@/components/ui/page-header';
import { SectionHeading } from '@/components/ui/section-heading';
import { PlanSampleForm } from '@/features/audit-sampling/components/plan-sample-form';
import { SamplesList } from '@/features/audit-sampling/components/samples-list';
import { useQueryInUrl } from '@/hooks/use-query-in-url';

const useStyles = makeStyles({
  section: { marginBottom: tokens.spacingVerticalXXL },
});

function parsePage(params: URLSearchParams): number {
  const page = Number(params.get('page'));
  return Number.isInteger(page) && page > 0 ? page : 1;
}

function pageSearchParams(page: number): URLSearchParams {
  return new URLSearchParams(page > 1 ? { page: String(page) } : {});
}

/** Plan and draw attribute samples, and the samples drawn so far. Loaded on demand. */
export function SamplesRoute() {
  const styles = useStyles();
  const [page, changePage] = useQueryInUrl(parsePage, pageSearchParams);
  return (
    <>
      <PageHeader
        title="Audit samples"
        description="Reproducible random selections of parcel receipts or tallies to check, each with its seed."
      />
      <section aria-labelledby="plan-heading" className={styles.section}>
        <SectionHeading id="plan-heading">Plan a sample</SectionHeading>
        <PlanSampleForm />
      </section>
      <section aria-labelledby="samples-heading">
        <SectionHeading id="samples-heading">Samples drawn</SectionHeading>
        <SamplesList page={page} onPageChange={changePage} />
      </section>
    </>
  );
}
