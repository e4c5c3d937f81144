import { makeStyles, tokens } from '@fluentui/react-components';

/** The layout the tally form's sections share. */
export const useSectionStyles = makeStyles({
  section: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    paddingBottom: tokens.spacingVerticalL,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
  },
  row: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-start',
    gap: tokens.spacingHorizontalL,
  },
  subheading: { margin: 0 },
  note: { margin: 0, color: tokens.colorNeutralForeground2, maxWidth: '72ch' },
  wideField: { width: '100%', maxWidth: '640px' },
  hintLine: { display: 'flex', gap: tokens.spacingHorizontalXS, alignItems: 'flex-start' },
  sum: { fontVariantNumeric: 'tabular-nums' },
});
