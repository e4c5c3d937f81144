import { Text } from '@fluentui/react-components';
import type { TallyCheckContext } from '@tallyloom/core';
import { useWatch, type Control } from 'react-hook-form';
import { SectionHeading } from '@/components/ui/section-heading';
import { formatCount } from '@/lib/format';
import { CountField } from './count-field';
import { useSectionStyles } from './form-styles';
import { GivenOutRows } from './given-out-rows';
import { openingHint } from './tally-labels';
import { FIGURE_NAMES, wholeNumberProblem, type TallyForm } from './tally-form-model';

export interface BlanketsSectionProps {
  control: Control<TallyForm>;
  context: TallyCheckContext;
  agencies: Array<{ id: number; name: string }>;
  openingEnteredByHand: boolean;
}

const readable = (typed: string) => !wholeNumberProblem(typed, '');

/** Blankets: opening stock, assembled by size, received finished, given out, closing. */
export function BlanketsSection({
  control,
  context,
  agencies,
  openingEnteredByHand,
}: BlanketsSectionProps) {
  const styles = useSectionStyles();
  const form = useWatch({ control, name: 'blankets' });
  const sizeOf = (id: number) => context.blanketSizes.find((size) => size.id === id);

  const parts = [
    form.opening,
    form.received,
    ...form.assembled.map((row) => row.count),
    ...form.given.map((row) => row.count),
  ];
  const expectedClosing = parts.every(readable)
    ? Number(form.opening) +
      form.assembled.reduce((sum, row) => sum + Number(row.count), 0) +
      Number(form.received) -
      form.given.reduce((sum, row) => sum + Number(row.count), 0)
    : undefined;

  return (
    <section className={styles.section} aria-labelledby="tally-blankets">
      <SectionHeading id="tally-blankets">Blankets</SectionHeading>
      <div className={styles.row}>
        <CountField
          control={control}
          name="blankets.opening"
          label="Opening stock"
          validate={(typed) => wholeNumberProblem(typed, FIGURE_NAMES['blankets.opening'])}
          hint={openingHint(context, openingEnteredByHand)}
          readOnly={!openingEnteredByHand}
        />
        <CountField
          control={control}
          name="blankets.received"
          label="Finished blankets received"
          validate={(typed) => wholeNumberProblem(typed, FIGURE_NAMES['blankets.received'])}
          hint={`Parcel receipts: ${formatCount(context.receipts.finishedBlankets)}`}
        />
      </div>
      <Text as="h3" weight="semibold" className={styles.subheading}>
        Assembled, by size
      </Text>
      <div className={styles.row}>
        {form.assembled.map((row, index) => {
          const size = sizeOf(row.blanketSizeId);
          return (
            <CountField
              key={row.blanketSizeId}
              control={control}
              name={`blankets.assembled.${index}.count`}
              label={size?.name ?? `Size ${row.blanketSizeId}`}
              validate={(typed) =>
                wholeNumberProblem(typed, `${size?.name ?? 'Blankets'} assembled`)
              }
              hint={size ? `${formatCount(size.panels)} panels each` : 'No longer in the catalogue'}
            />
          );
        })}
      </div>
      <Text as="h3" weight="semibold" className={styles.subheading}>
        Given out, by size and partner agency
      </Text>
      <GivenOutRows control={control} sizes={context.blanketSizes} agencies={agencies} />
      <div className={styles.row}>
        <CountField
          control={control}
          name="blankets.closing"
          label="Closing stock"
          validate={(typed) => wholeNumberProblem(typed, FIGURE_NAMES['blankets.closing'])}
          hint={
            expectedClosing === undefined
              ? undefined
              : `Opening + assembled + received − given = ${formatCount(expectedClosing)}`
          }
        />
      </div>
    </section>
  );
}
