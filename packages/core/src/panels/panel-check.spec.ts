import { DomainError } from '../errors/domain-error';
import { Length } from '../units/length';
import { checkPanelSize, DEFAULT_PANEL_TOLERANCE_IN } from './panel-check';

const inches = (value: number): Length => ({ value, unit: 'in' });
const cm = (value: number): Length => ({ value, unit: 'cm' });

describe('checkPanelSize', () => {
  it('defaults to a tolerance of half an inch', () => {
    // common practice: charity panel guidance commonly accepts about ±½ in
    expect(DEFAULT_PANEL_TOLERANCE_IN).toBe(0.5);
  });

  it('passes a panel of exactly 7 × 9 in', () => {
    // common practice: the standard panel is 7 × 9 in
    expect(checkPanelSize({ width: inches(7), height: inches(9) })).toEqual({
      withinTolerance: true,
      widthDeviationIn: 0,
      heightDeviationIn: 0,
      measuredLandscape: false,
      messages: [],
    });
  });

  it('passes a panel measured as 17.78 × 22.86 cm', () => {
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 in = 2.54 cm exactly, so 7 × 9 in = 17.78 × 22.86 cm
    const result = checkPanelSize({ width: cm(17.78), height: cm(22.86) });
    expect(result.withinTolerance).toBe(true);
    expect(result.widthDeviationIn).toBeCloseTo(0, 10);
    expect(result.heightDeviationIn).toBeCloseTo(0, 10);
  });

  it('accepts a panel measured landscape and compares it turned upright', () => {
    const result = checkPanelSize({ width: inches(9), height: inches(7) });
    expect(result).toMatchObject({
      withinTolerance: true,
      widthDeviationIn: 0,
      heightDeviationIn: 0,
      measuredLandscape: true,
    });
  });

  it('passes a panel exactly on the tolerance limit, in inches and in centimetres', () => {
    expect(checkPanelSize({ width: inches(7.5), height: inches(8.5) })).toMatchObject({
      withinTolerance: true,
      widthDeviationIn: 0.5,
      heightDeviationIn: -0.5,
    });
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 in = 2.54 cm exactly, so 7.5 in = 19.05 cm and 9.5 in = 24.13 cm
    const result = checkPanelSize({ width: cm(19.05), height: cm(24.13) });
    expect(result.withinTolerance).toBe(true);
    expect(result.widthDeviationIn).toBeCloseTo(0.5, 10);
    expect(result.heightDeviationIn).toBeCloseTo(0.5, 10);
  });

  it('fails a panel one inch too wide and says by how much', () => {
    expect(checkPanelSize({ width: inches(8), height: inches(9) })).toEqual({
      withinTolerance: false,
      widthDeviationIn: 1,
      heightDeviationIn: 0,
      measuredLandscape: false,
      messages: ['Width (shorter side) 8 in is 1 in over the 7 in target; tolerance is ±0.5 in.'],
    });
  });

  it('reports each side that is off, short or long', () => {
    const result = checkPanelSize({ width: inches(6.25), height: inches(10) });
    expect(result.withinTolerance).toBe(false);
    expect(result.widthDeviationIn).toBe(-0.75);
    expect(result.heightDeviationIn).toBe(1);
    expect(result.messages).toEqual([
      'Width (shorter side) 6.25 in is 0.75 in under the 7 in target; tolerance is ±0.5 in.',
      'Height (longer side) 10 in is 1 in over the 9 in target; tolerance is ±0.5 in.',
    ]);
  });

  it('repeats a centimetre measurement as given, with its inches', () => {
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 in = 2.54 cm exactly, so 20.32 cm = 8 in
    const result = checkPanelSize({ width: cm(20.32), height: cm(22.86) });
    expect(result.withinTolerance).toBe(false);
    expect(result.widthDeviationIn).toBeCloseTo(1, 10);
    expect(result.messages).toEqual([
      'Width (shorter side) 20.32 cm (8 in) is 1 in over the 7 in target; tolerance is ±0.5 in.',
    ]);
  });

  it('names the longer side as the height when a landscape panel is too long', () => {
    const result = checkPanelSize({ width: inches(10), height: inches(7) });
    expect(result).toMatchObject({
      withinTolerance: false,
      widthDeviationIn: 0,
      heightDeviationIn: 1,
      measuredLandscape: true,
    });
    expect(result.messages).toEqual([
      'Height (longer side) 10 in is 1 in over the 9 in target; tolerance is ±0.5 in.',
    ]);
  });

  it('accepts mixed units', () => {
    expect(checkPanelSize({ width: inches(7), height: cm(22.86) }).withinTolerance).toBe(true);
  });

  it('follows the tolerance setting', () => {
    const oneInchWide = { width: inches(8), height: inches(9) };
    expect(checkPanelSize(oneInchWide, 1).withinTolerance).toBe(true);
    expect(checkPanelSize(oneInchWide, 0.75).withinTolerance).toBe(false);
    expect(checkPanelSize({ width: inches(7.1), height: inches(9) }, 0).messages).toEqual([
      'Width (shorter side) 7.1 in is 0.1 in over the 7 in target; tolerance is ±0 in.',
    ]);
  });

  it('rejects impossible measurements and tolerances, naming the argument', () => {
    expect(() => checkPanelSize({ width: inches(-7), height: inches(9) })).toThrow(DomainError);
    expect(() => checkPanelSize({ width: inches(-7), height: inches(9) })).toThrow(
      'measured.width.value must be greater than 0; got -7.',
    );
    expect(() => checkPanelSize({ width: inches(7), height: cm(0) })).toThrow(
      'measured.height.value must be greater than 0; got 0.',
    );
    expect(() =>
      checkPanelSize({ width: inches(7), height: { value: 229, unit: 'mm' } as unknown as Length }),
    ).toThrow("measured.height.unit must be 'in' or 'cm'; got \"mm\".");
    expect(() => checkPanelSize({ width: inches(7), height: inches(9) }, -0.5)).toThrow(
      'toleranceIn must be 0 or more; got -0.5.',
    );
  });
});
