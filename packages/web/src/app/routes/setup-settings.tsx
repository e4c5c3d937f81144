import { makeStyles, tokens } from '@fluentui/react-components';
import { HourValuesPanel } from '@/features/network-setup/components/hour-values-panel';
import { SettingsForm } from '@/features/network-setup/components/settings-form';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXL },
});

/** Set-up: the network's settings and the dated value of a volunteer hour. */
export function SetupSettingsRoute() {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      <SettingsForm />
      <HourValuesPanel />
    </div>
  );
}
