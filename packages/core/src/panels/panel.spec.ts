import { inchesToCm } from '../units/length';
import { PANEL_HEIGHT_IN, PANEL_WIDTH_IN } from './panel';

describe('standard panel', () => {
  it('is 7 in wide and 9 in tall', () => {
    // common practice: the standard panel is 7 × 9 in, portrait
    expect(PANEL_WIDTH_IN).toBe(7);
    expect(PANEL_HEIGHT_IN).toBe(9);
  });

  it('is 17.78 cm wide and 22.86 cm tall', () => {
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 in = 2.54 cm exactly (International Yard and Pound Agreement, 1959)
    expect(inchesToCm(PANEL_WIDTH_IN)).toBeCloseTo(17.78, 10);
    expect(inchesToCm(PANEL_HEIGHT_IN)).toBeCloseTo(22.86, 10);
  });
});
