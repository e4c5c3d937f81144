import { Text } from '@fluentui/react-components';
import { useWatch, type Control } from 'react-hook-form';
import { yarnInWords } from '@/components/tallies/yarn';
import { SectionHeading } from '@/components/ui/section-heading';
import { CountField } from './count-field';
import { useSectionStyles } from './form-styles';
import { SelectField } from './select-field';
import { TextAreaField } from './text-area-field';
import { hoursProblem, yarnProblem, type TallyForm } from './tally-form-model';

/** The typed weight in both units, or undefined while it is empty or not a weight. */
function yarnConversion(typed: string, unit: 'kg' | 'lb'): string | undefined {
  if (typed.trim() === '' || yarnProblem(typed)) return undefined;
  return yarnInWords(Number(typed), unit);
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
