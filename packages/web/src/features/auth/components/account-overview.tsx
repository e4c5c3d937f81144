import { makeStyles, tokens } from '@fluentui/react-components';
import { ROLE_LABELS } from '@tallyloom/core';
import { ErrorState } from '@/components/ui/error-state';
import { FactList } from '@/components/ui/fact-list';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { scopeLabel } from '@/lib/scope';
import { useMe } from '../api/get-me';
import { ChangePasswordForm } from './change-password-form';

const aboutHeadingId = 'account-about-heading';
const passwordHeadingId = 'account-password-heading';

const useStyles = makeStyles({
  layout: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(320px, 440px))',
    gap: tokens.spacingHorizontalXXL,
    alignItems: 'start',
  },
});

/** Who the signed-in person is, as the server knows them, and where to change the password. */
export function AccountOverview() {
  const styles = useStyles();
  const me = useMe();

  let about;
  if (me.isPending) about = <LoadingState label="Loading your details…" />;
  else if (me.isError) {
    about = (
      <ErrorState
        title="Your details could not be loaded"
        error={me.error}
        onRetry={() => void me.refetch()}
        retrying={me.isFetching}
        headingLevel={3}
      />
    );
  } else {
    const rows: Array<[string, string]> = [
      ['Name', me.data.displayName],
      ['E-mail', me.data.email],
      ['Role', ROLE_LABELS[me.data.role]],
      ['Scope', scopeLabel(me.data)],
    ];
    about = <FactList rows={rows} />;
  }

  return (
    <div className={styles.layout}>
      <section aria-labelledby={aboutHeadingId}>
        <SectionHeading id={aboutHeadingId}>About you</SectionHeading>
        {about}
      </section>
      <section aria-labelledby={passwordHeadingId}>
        <SectionHeading id={passwordHeadingId}>Change password</SectionHeading>
        <ChangePasswordForm accountWords={me.data ? [me.data.email, me.data.displayName] : []} />
      </section>
    </div>
  );
}
