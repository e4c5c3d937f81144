import { Field, Select, type FieldProps } from '@fluentui/react-components';
import { useController, type Control, type FieldPath } from 'react-hook-form';
import type { TallyForm } from './tally-form-model';

export interface SelectFieldProps {
  control: Control<TallyForm>;
  name: FieldPath<TallyForm>;
  label: FieldProps['label'];
  options: Array<{ value: string; label: string }>;
  /** The first, empty choice ("Choose a size"); leave out when a choice is always made. */
  placeholder?: string;
  /** Says what is wrong with the choice, or undefined when it is fine. */
  validate?: (value: string) => string | undefined;
  className?: string;
}

/** A choice on the tally form, from a native select (keyboard and screen readers know it). */
export function SelectField({
  control,
  name,
  label,
  options,
  placeholder,
  validate,
  className,
}: SelectFieldProps) {
  const { field, fieldState } = useController({
    control,
    name,
    rules: {
      validate: (value) =>
        validate && typeof value === 'string' ? (validate(value) ?? true) : true,
    },
  });
  return (
    <Field label={label} validationMessage={fieldState.error?.message} className={className}>
      <Select
        ref={field.ref}
        name={field.name}
        value={typeof field.value === 'string' ? field.value : ''}
        onChange={(_event, data) => field.onChange(data.value)}
        onBlur={field.onBlur}
      >
        {placeholder !== undefined ? <option value="">{placeholder}</option> : null}
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </Select>
    </Field>
  );
}
