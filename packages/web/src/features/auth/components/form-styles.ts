import { makeStyles, tokens } from '@fluentui/react-components';

/** The one-column layout every sign-in and password form shares. */
export const useFormStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  actions: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    marginTop: tokens.spacingVerticalXS,
  },
  text: { margin: 0 },
  quiet: { margin: 0, color: tokens.colorNeutralForeground2 },
});
