import { Text } from '@fluentui/react-components';
import { KG_PER_POUND, kgToPounds, poundsToKg } from '@tallyloom/core';
import { useWatch, type Control } from 'react-hook-form';
import { SectionHeading } from '@/components/ui/section-heading';
import { CountField } from './count-field';
import { useSectionStyles } from './form-styles';
import { SelectField } from './select-field';
import { TextAreaField } from './text-area-field';
import { hoursProblem, yarnProblem, type TallyForm } from './tally-form-model';

// Enough places for the exact pound (0.45359237 kg) times a weight with 3 decimals.
const exact = new Intl.NumberFormat('en-US', { maximumFractionDigits: 11 });
const rounded = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });

/** "12 lb = 5.44310844 kg", exact (1 lb is 0.45359237 kg by definition); kg → lb is rounded. */
export function yarnConversion(typed: string, unit: 'kg' | 'lb'): string | undefined {
  if (typed.trim() === '' || yarnProblem(typed)) return undefined;
  const value = Number(typed);
  if (unit === 'lb') {
    return `${exact.format(value)} lb = ${exact.format(poundsToKg(value))} kg (1 lb = ${exact.format(KG_PER_POUND)} kg exactly)`;
  }
  return `${exact.format(value)} kg ≈ ${rounded.format(kgToPounds(value))} lb`;
}

/** Volunteer hours, yarn donated and notes. */
export function MoreSection({ control }: { control: Control<TallyForm> }) {
  const styles = useSectionStyles();
  const yarn = useWatch({ control, name: 'yarn' });
  const conversion = yarnConversion(yarn.value, yarn.unit);

  return (
    <section className={styles.section} aria-labelledby="tally-more">
      <SectionHeading id="tally-more">Hours, yarn and notes</SectionHeading>
      <div className={styles.row}>
        <CountField
          control={control}
          name="volunteerHours"
          label="Volunteer hours"
          decimal
          validate={hoursProblem}
          hint="Up to 2 decimals, e.g. 12.5"
        />
        <CountField
          control={control}
          name="yarn.value"
          label="Yarn donated"
          decimal
          validate={yarnProblem}
          hint="Leave empty if none"
        />
        <SelectField
          control={control}
          name="yarn.unit"
          label="Unit"
          options={[
            { value: 'kg', label: 'kilograms (kg)' },
            { value: 'lb', label: 'pounds (lb)' },
          ]}
        />
      </div>
      {conversion ? (
        <Text as="p" className={styles.note} aria-live="polite">
          {conversion}
        </Text>
      ) : null}
      <TextAreaField control={control} name="notes" label="Notes" className={styles.wideField} />
    </section>
  );
}
