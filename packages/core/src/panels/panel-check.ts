import { requireNonNegativeNumber, requirePositiveNumber } from '../errors/require';
import { Length, toInches } from '../units/length';
import { PANEL_HEIGHT_IN, PANEL_WIDTH_IN } from './panel';

// Charity panel guidance commonly accepts about ±½ in either way (common practice); chapters
// can change it in settings.
export const DEFAULT_PANEL_TOLERANCE_IN = 0.5;

export interface PanelMeasurement {
  width: Length;
  height: Length;
}

export interface PanelCheckResult {
  withinTolerance: boolean;
  /** Shorter side minus 7 in: positive when too wide, negative when too narrow. */
  widthDeviationIn: number;
  /** Longer side minus 9 in: positive when too tall, negative when too short. */
  heightDeviationIn: number;
  /** True when the sides were given landscape (the longer one as width) and were swapped. */
  measuredLandscape: boolean;
  /** One sentence per side outside tolerance; empty when the panel passes. */
  messages: string[];
}

// Converting centimetres can leave 7.5 in as 7.500000000000001; a panel exactly on the limit passes.
const ROUNDING_SLACK_IN = 1e-9;

function formatIn(inches: number): string {
  return `${Number(inches.toFixed(2))} in`;
}

function describeSide(
  side: string,
  measured: Length,
  measuredIn: number,
  targetIn: number,
  toleranceIn: number,
): string {
  const deviation = measuredIn - targetIn;
  const asGiven =
    measured.unit === 'cm'
      ? `${measured.value} cm (${formatIn(measuredIn)})`
      : formatIn(measuredIn);
  const direction = deviation > 0 ? 'over' : 'under';
  return `${side} ${asGiven} is ${formatIn(Math.abs(deviation))} ${direction} the ${formatIn(targetIn)} target; tolerance is ±${formatIn(toleranceIn)}.`;
}

function measuredSideIn(side: Length, argument: string): number {
  // Checked in the unit given, so the message repeats what the person typed.
  requirePositiveNumber(`${argument}.value`, side.value);
  return toInches(side, argument);
}

/**
 * Checks a measured panel against 7 × 9 in. Makers lay a panel down either way before measuring,
 * so the shorter side is compared with 7 in and the longer with 9 in; a panel handed in landscape
 * is the same panel turned, and sews into a blanket the same way. Pairing sorted sides with sorted
 * targets also gives the smallest deviations of the two possible pairings.
 */
export function checkPanelSize(
  measured: PanelMeasurement,
  toleranceIn: number = DEFAULT_PANEL_TOLERANCE_IN,
): PanelCheckResult {
  requireNonNegativeNumber('toleranceIn', toleranceIn);
  const givenWidthIn = measuredSideIn(measured.width, 'measured.width');
  const givenHeightIn = measuredSideIn(measured.height, 'measured.height');

  const measuredLandscape = givenWidthIn > givenHeightIn;
  const [shorter, shorterIn, longer, longerIn] = measuredLandscape
    ? [measured.height, givenHeightIn, measured.width, givenWidthIn]
    : [measured.width, givenWidthIn, measured.height, givenHeightIn];

  const widthDeviationIn = shorterIn - PANEL_WIDTH_IN;
  const heightDeviationIn = longerIn - PANEL_HEIGHT_IN;
  const limit = toleranceIn + ROUNDING_SLACK_IN;

  const messages: string[] = [];
  if (Math.abs(widthDeviationIn) > limit) {
    messages.push(
      describeSide('Width (shorter side)', shorter, shorterIn, PANEL_WIDTH_IN, toleranceIn),
    );
  }
  if (Math.abs(heightDeviationIn) > limit) {
    messages.push(
      describeSide('Height (longer side)', longer, longerIn, PANEL_HEIGHT_IN, toleranceIn),
    );
  }

  return {
    withinTolerance: messages.length === 0,
    widthDeviationIn,
    heightDeviationIn,
    measuredLandscape,
    messages,
  };
}
