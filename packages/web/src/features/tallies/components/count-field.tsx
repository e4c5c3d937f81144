import {
  Field,
  Input,
  makeStyles,
  mergeClasses,
  tokens,
  type FieldProps,
} from '@fluentui/react-components';
import { useController, type Control, type FieldPath } from 'react-hook-form';
import type { TallyForm } from './tally-form-model';

const useStyles = makeStyles({
  root: { width: '176px' },
  // The box fills its field: a native input is ~20 characters wide unless told otherwise.
  box: { width: '100%', minWidth: 0 },
  input: { textAlign: 'end', fontVariantNumeric: 'tabular-nums', width: '100%', minWidth: 0 },
  readOnly: { backgroundColor: tokens.colorNeutralBackground3 },
});

export interface CountFieldProps {
  control: Control<TallyForm>;
  name: FieldPath<TallyForm>;
  label: FieldProps['label'];
  /** Says what is wrong with the typed text, or undefined when it is fine. */
  validate: (text: string) => string | undefined;
  hint?: FieldProps['hint'];
  readOnly?: boolean;
  /** Whole numbers only (the default) or a decimal such as hours. */
  decimal?: boolean;
  className?: string;
  /** For a grid of boxes whose visible label is the row and column heading. */
  ariaLabel?: string;
}

/**
 * A figure of the tally: a right-aligned number box whose message says in words what it takes.
 * The text stays as typed; the form reads it when it checks or saves.
 */
export function CountField({
  control,
  name,
  label,
  validate,
  hint,
  readOnly,
  decimal,
  className,
  ariaLabel,
}: CountFieldProps) {
  const styles = useStyles();
  const { field, fieldState } = useController({
    control,
    name,
    rules: { validate: (value) => (typeof value === 'string' ? (validate(value) ?? true) : true) },
  });
  return (
    <Field
      label={label}
      hint={hint}
      validationMessage={fieldState.error?.message}
      className={mergeClasses(styles.root, className)}
    >
      <Input
        ref={field.ref}
        name={field.name}
        type="number"
        min={0}
        step={decimal ? 0.01 : 1}
        inputMode={decimal ? 'decimal' : 'numeric'}
        readOnly={readOnly}
        aria-label={ariaLabel}
        className={mergeClasses(styles.box, readOnly && styles.readOnly)}
        input={{ className: styles.input }}
        value={typeof field.value === 'string' ? field.value : ''}
        onChange={(_event, data) => field.onChange(data.value)}
        onBlur={field.onBlur}
      />
    </Field>
  );
}
