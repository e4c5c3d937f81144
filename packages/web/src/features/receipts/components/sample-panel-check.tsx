import {
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Text,
  tokens,
  makeStyles,
} from '@fluentui/react-components';
import { checkPanelSize, type LengthUnit } from '@tallyloom/core';
import { measurement } from './receipt-draft';

const useStyles = makeStyles({
  pending: { color: tokens.colorNeutralForeground2 },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalL },
});

export interface SamplePanelCheckProps {
  width: string;
  height: string;
  unit: LengthUnit;
  /** The tolerance setting in inches; undefined while it loads. */
  toleranceIn: number | undefined;
}

/** Checks the measured panel against 7 × 9 in as it is typed, with the network's tolerance. */
export function SamplePanelCheck({ width, height, unit, toleranceIn }: SamplePanelCheckProps) {
  const styles = useStyles();
  const widthValue = measurement(width);
  const heightValue = measurement(height);
  if (widthValue === undefined || heightValue === undefined) return null;
  if (toleranceIn === undefined) {
    return (
      <Text as="p" className={styles.pending} aria-live="polite">
        Loading the tolerance setting to check the panel…
      </Text>
    );
  }
  const result = checkPanelSize(
    { width: { value: widthValue, unit }, height: { value: heightValue, unit } },
    toleranceIn,
  );
  const tolerance = `${Number(toleranceIn.toFixed(2))} in`;
  return (
    <div aria-live="polite">
      {result.withinTolerance ? (
        <MessageBar intent="success">
          <MessageBarBody>
            <MessageBarTitle>Within tolerance</MessageBarTitle>
            The sample panel is within ±{tolerance} of 7 × 9 in.
          </MessageBarBody>
        </MessageBar>
      ) : (
        <MessageBar intent="warning" layout="multiline">
          <MessageBarBody>
            <MessageBarTitle>Outside tolerance</MessageBarTitle>
            <ul className={styles.list}>
              {result.messages.map((message) => (
                <li key={message}>{message}</li>
              ))}
            </ul>
          </MessageBarBody>
        </MessageBar>
      )}
    </div>
  );
}
