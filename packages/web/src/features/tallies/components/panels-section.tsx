import { Text } from '@fluentui/react-components';
import { SET_ASIDE_LABELS, SET_ASIDE_REASONS, type TallyCheckContext } from '@tallyloom/core';
import { useWatch, type Control } from 'react-hook-form';
import { SectionHeading } from '@/components/ui/section-heading';
import { formatCount } from '@/lib/format';
import { CountField } from './count-field';
import { useSectionStyles } from './form-styles';
import { openingHint } from './tally-labels';
import { TextAreaField } from './text-area-field';
import { FIGURE_NAMES, setAsideName, wholeNumberProblem, type TallyForm } from './tally-form-model';

export interface PanelsSectionProps {
  control: Control<TallyForm>;
  context: TallyCheckContext;
  openingEnteredByHand: boolean;
}

function receiptsHint(context: TallyCheckContext): string {
  const { count, panelsAccepted } = context.receipts;
  return `From ${formatCount(count)} parcel ${count === 1 ? 'receipt' : 'receipts'}: ${formatCount(panelsAccepted)} panels`;
}

/** Panels: opening stock, accepted (from the receipts), set aside, used in assembly, closing. */
export function PanelsSection({ control, context, openingEnteredByHand }: PanelsSectionProps) {
  const styles = useSectionStyles();
  const [opening, accepted, used] = useWatch({
    control,
    name: ['panels.opening', 'panels.accepted', 'panels.usedInAssembly'],
  });
  const readable = [opening, accepted, used].every((typed) => !wholeNumberProblem(typed, ''));
  const expectedClosing = readable ? Number(opening) + Number(accepted) - Number(used) : undefined;
  const differsFromReceipts =
    !wholeNumberProblem(accepted, '') && Number(accepted) !== context.receipts.panelsAccepted;
  const reason = useWatch({ control, name: 'receiptsDifferenceReason' });

  return (
    <section className={styles.section} aria-labelledby="tally-panels">
      <SectionHeading id="tally-panels">Panels</SectionHeading>
      <div className={styles.row}>
        <CountField
          control={control}
          name="panels.opening"
          label="Opening stock"
          validate={(typed) => wholeNumberProblem(typed, FIGURE_NAMES['panels.opening'])}
          hint={openingHint(context, openingEnteredByHand)}
          readOnly={!openingEnteredByHand}
        />
        <CountField
          control={control}
          name="panels.accepted"
          label="Accepted"
          validate={(typed) => wholeNumberProblem(typed, FIGURE_NAMES['panels.accepted'])}
          hint={receiptsHint(context)}
        />
        <CountField
          control={control}
          name="panels.usedInAssembly"
          label="Used in assembly"
          validate={(typed) => wholeNumberProblem(typed, FIGURE_NAMES['panels.usedInAssembly'])}
        />
        <CountField
          control={control}
          name="panels.closing"
          label="Closing stock"
          validate={(typed) => wholeNumberProblem(typed, FIGURE_NAMES['panels.closing'])}
          hint={
            expectedClosing === undefined
              ? undefined
              : `Opening + accepted − used = ${formatCount(expectedClosing)}`
          }
        />
      </div>
      {differsFromReceipts || reason ? (
        <TextAreaField
          control={control}
          name="receiptsDifferenceReason"
          label="Why accepted panels differ from the parcel receipts"
          hint={`The receipts of the month add up to ${formatCount(context.receipts.panelsAccepted)} panels.`}
          className={styles.wideField}
        />
      ) : null}
      <Text as="h3" weight="semibold" className={styles.subheading}>
        Set aside, by reason (not part of the stock)
      </Text>
      <div className={styles.row}>
        {SET_ASIDE_REASONS.map((reason) => (
          <CountField
            key={reason}
            control={control}
            name={`panels.setAside.${reason}`}
            label={SET_ASIDE_LABELS[reason]}
            validate={(typed) => wholeNumberProblem(typed, setAsideName(reason))}
            hint={`Receipts: ${formatCount(context.receipts.setAside[reason])}`}
          />
        ))}
      </div>
    </section>
  );
}
