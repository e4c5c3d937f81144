import { Field, Textarea, type FieldProps } from '@fluentui/react-components';
import {
  useController,
  type Control,
  type FieldPath,
  type FieldValues,
  type RegisterOptions,
} from 'react-hook-form';

export interface TextAreaFieldProps<T extends FieldValues> {
  control: Control<T>;
  name: FieldPath<T>;
  label: FieldProps['label'];
  hint?: FieldProps['hint'];
  required?: boolean;
  rules?: RegisterOptions<T, FieldPath<T>>;
  /** A message from outside the field's own rules, e.g. a check run on submit. */
  message?: string;
  className?: string;
}

/** Free text (a reason, a note) of one of the tally's forms, with its message beneath. */
export function TextAreaField<T extends FieldValues>({
  control,
  name,
  label,
  hint,
  required,
  rules,
  message,
  className,
}: TextAreaFieldProps<T>) {
  const { field, fieldState } = useController({ control, name, rules });
  return (
    <Field
      label={label}
      hint={hint}
      required={required}
      validationMessage={message ?? fieldState.error?.message}
      className={className}
    >
      <Textarea
        ref={field.ref}
        name={field.name}
        rows={3}
        resize="vertical"
        value={typeof field.value === 'string' ? field.value : ''}
        onChange={(_event, data) => field.onChange(data.value)}
        onBlur={field.onBlur}
      />
    </Field>
  );
}
