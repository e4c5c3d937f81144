import type { BrandVariants } from '@fluentui/react-components';

/**
 * Tallyloom's deep teal ramp. Fluent reads step 80 as the primary (buttons, links, selected
 * states); lower steps are darker (hover, pressed), higher steps are tints for quiet backgrounds.
 * Steps 10–80 run from near-black teal to the primary, 90–160 from the primary to a pale wash.
 */
export const tallyloomBrandRamp: BrandVariants = {
  10: '#051A1B',
  20: '#072728',
  30: '#083132',
  40: '#0A3A3C',
  50: '#0B4345',
  60: '#0D4C4D',
  70: '#0E5456',
  80: '#0F5C5E',
  90: '#317475',
  100: '#4F8889',
  110: '#6B9C9C',
  120: '#86AFAF',
  130: '#A0C1C1',
  140: '#BAD3D3',
  150: '#D4E5E4',
  160: '#EDF6F5',
};

/** The warm accent: a thin bar and the active navigation marker, nothing more. */
export const emberAccent = '#B4531F';
