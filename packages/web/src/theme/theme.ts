import { createLightTheme, type Theme } from '@fluentui/react-components';
import { emberAccent, tallyloomBrandRamp } from './brand-ramp';

const roboto = "Roboto, 'Helvetica Neue', Arial, sans-serif";

export const tallyloomTheme: Theme = {
  ...createLightTheme(tallyloomBrandRamp),
  fontFamilyBase: roboto,
};

/** The colours the console leans on, exported so their contrast is checked in a test. */
export const themeColours = {
  text: tallyloomTheme.colorNeutralForeground1,
  textSecondary: tallyloomTheme.colorNeutralForeground2,
  canvas: tallyloomTheme.colorNeutralBackground1,
  sideCanvas: tallyloomTheme.colorNeutralBackground2,
  brandText: tallyloomTheme.colorBrandForeground1,
  link: tallyloomTheme.colorBrandForegroundLink,
  brandBackground: tallyloomTheme.colorBrandBackground,
  brandBackgroundHover: tallyloomTheme.colorBrandBackgroundHover,
  brandBackgroundPressed: tallyloomTheme.colorBrandBackgroundPressed,
  brandWash: tallyloomTheme.colorBrandBackground2,
  textOnBrand: tallyloomTheme.colorNeutralForegroundOnBrand,
  accent: emberAccent,
} as const;
