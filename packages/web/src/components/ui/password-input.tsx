import { Button, Input, type InputProps } from '@fluentui/react-components';
import { Eye20Regular, EyeOff20Regular } from '@fluentui/react-icons';
import { useState, type Ref } from 'react';

export type PasswordInputProps = Omit<InputProps, 'type' | 'contentAfter'> & {
  ref?: Ref<HTMLInputElement>;
};

/**
 * A password field with a show/hide switch, so a long passphrase can be checked before it is
 * sent. The switch is a toggle button after the field, reachable with Tab.
 */
export function PasswordInput({ ref, ...props }: PasswordInputProps) {
  const [visible, setVisible] = useState(false);
  return (
    <Input
      {...props}
      ref={ref}
      type={visible ? 'text' : 'password'}
      contentAfter={
        <Button
          appearance="transparent"
          size="small"
          icon={visible ? <EyeOff20Regular /> : <Eye20Regular />}
          aria-label={visible ? 'Hide password' : 'Show password'}
          aria-pressed={visible}
          onClick={() => setVisible((current) => !current)}
        />
      }
    />
  );
}
