import { makeStyles, tokens } from '@fluentui/react-components';

/** A section's heading with its main action at the other end. */
export const useSectionStyles = makeStyles({
  toolbar: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalS,
  },
  heading: { marginBottom: 0 },
});
