import {
  Button,
  makeStyles,
  MessageBar,
  MessageBarBody,
  Text,
  tokens,
} from '@fluentui/react-components';
import { Add20Regular, Delete20Regular } from '@fluentui/react-icons';
import { useFieldArray, useWatch, type Control } from 'react-hook-form';
import { isBabySize, SAFE_SLEEP_CAUTION } from '@/components/tallies/safe-sleep';
import { CountField } from './count-field';
import { SelectField } from './select-field';
import {
  chosenProblem,
  emptyGivenRow,
  wholeNumberProblem,
  type TallyForm,
} from './tally-form-model';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  line: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    gap: tokens.spacingHorizontalM,
  },
  select: { width: '200px' },
  wideSelect: { width: '280px' },
  remove: { marginBottom: '2px' },
  none: { margin: 0, color: tokens.colorNeutralForeground2 },
});

export interface GivenOutRowsProps {
  control: Control<TallyForm>;
  sizes: Array<{ id: number; name: string }>;
  agencies: Array<{ id: number; name: string }>;
}

/** Blankets given out: one editable line per blanket size and partner agency. */
export function GivenOutRows({ control, sizes, agencies }: GivenOutRowsProps) {
  const styles = useStyles();
  const { fields, append, remove } = useFieldArray({ control, name: 'blankets.given' });
  const rows = useWatch({ control, name: 'blankets.given' });
  const sizeOptions = sizes.map((size) => ({ value: String(size.id), label: size.name }));
  const agencyOptions = agencies.map((agency) => ({
    value: String(agency.id),
    label: agency.name,
  }));
  const babyGiven = rows.some((row) =>
    isBabySize(sizes.find((size) => String(size.id) === row.blanketSizeId)?.name ?? ''),
  );

  return (
    <div className={styles.root}>
      {fields.length === 0 ? (
        <Text as="p" className={styles.none}>
          No blankets given out this month. Add a line for each blanket size and partner agency.
        </Text>
      ) : null}
      {fields.map((line, index) => (
        <div key={line.id} className={styles.line} role="group" aria-label={`Line ${index + 1}`}>
          <SelectField
            control={control}
            name={`blankets.given.${index}.blanketSizeId`}
            label="Blanket size"
            placeholder="Choose a size"
            options={sizeOptions}
            validate={(id) => chosenProblem(id, 'a blanket size')}
            className={styles.select}
          />
          <SelectField
            control={control}
            name={`blankets.given.${index}.partnerAgencyId`}
            label="Partner agency"
            placeholder="Choose an agency"
            options={agencyOptions}
            validate={(id) => chosenProblem(id, 'a partner agency')}
            className={styles.wideSelect}
          />
          <CountField
            control={control}
            name={`blankets.given.${index}.count`}
            label="Blankets"
            validate={(typed) => wholeNumberProblem(typed, 'Blankets given out')}
          />
          <Button
            className={styles.remove}
            icon={<Delete20Regular />}
            aria-label={`Remove line ${index + 1}`}
            onClick={() => remove(index)}
          >
            Remove
          </Button>
        </div>
      ))}
      <div>
        <Button icon={<Add20Regular />} onClick={() => append({ ...emptyGivenRow })}>
          Add a line
        </Button>
      </div>
      {babyGiven ? (
        <MessageBar intent="info" layout="multiline">
          <MessageBarBody>{SAFE_SLEEP_CAUTION}</MessageBarBody>
        </MessageBar>
      ) : null}
    </div>
  );
}
