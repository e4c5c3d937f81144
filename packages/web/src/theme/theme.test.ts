import { hex as contrastRatio } from 'wcag-contrast';
import { describe, expect, it } from 'vitest';
import { tallyloomBrandRamp } from './brand-ramp';
import { tallyloomTheme, themeColours } from './theme';

// Fluent writes white as "#ffffff" and some greys in short forms; wcag-contrast reads any hex.
const t = tallyloomTheme;

describe('Tallyloom theme contrast', () => {
  // Source: WCAG 2.2 SC 1.4.3 Contrast (Minimum): text needs at least 4.5:1 against its background.
  const minimumTextContrast = 4.5;

  it.each([
    ['body text on the canvas', t.colorNeutralForeground1, t.colorNeutralBackground1],
    ['secondary text on the canvas', t.colorNeutralForeground2, t.colorNeutralBackground1],
    ['secondary text on the side navigation', t.colorNeutralForeground2, t.colorNeutralBackground2],
    ['brand text on the canvas', t.colorBrandForeground1, t.colorNeutralBackground1],
    ['links on the canvas', t.colorBrandForegroundLink, t.colorNeutralBackground1],
    ['active navigation text on its tint', t.colorBrandForeground1, t.colorBrandBackground2],
    ['text on a primary button', t.colorNeutralForegroundOnBrand, t.colorBrandBackground],
    [
      'text on a hovered primary button',
      t.colorNeutralForegroundOnBrand,
      t.colorBrandBackgroundHover,
    ],
    [
      'text on a pressed primary button',
      t.colorNeutralForegroundOnBrand,
      t.colorBrandBackgroundPressed,
    ],
  ])('%s reaches 4.5:1', (_pair, foreground, background) => {
    expect(contrastRatio(foreground, background)).toBeGreaterThanOrEqual(minimumTextContrast);
  });

  // Source: WCAG 2.2 SC 1.4.11 Non-text Contrast: a state marker needs at least 3:1 against what is next to it.
  it('keeps the ember accent visible as a marker on the canvas and the navigation', () => {
    expect(contrastRatio(themeColours.accent, t.colorNeutralBackground1)).toBeGreaterThanOrEqual(3);
    expect(contrastRatio(themeColours.accent, t.colorBrandBackground2)).toBeGreaterThanOrEqual(3);
  });

  it('builds the theme from our own ramp, with Roboto as the base font', () => {
    expect(t.colorBrandBackground).toBe(tallyloomBrandRamp[80]);
    expect(t.fontFamilyBase.startsWith('Roboto')).toBe(true);
  });
});
