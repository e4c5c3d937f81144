import { MessageBar, MessageBarBody, MessageBarTitle } from '@fluentui/react-components';

export interface FormAlertProps {
  title?: string;
  messages: string[];
  intent?: 'error' | 'warning';
}

/** What went wrong with a submission as a whole, read out when it appears. */
export function FormAlert({ title, messages, intent = 'error' }: FormAlertProps) {
  if (messages.length === 0) return null;
  return (
    <div role="alert">
      <MessageBar intent={intent} layout="multiline">
        <MessageBarBody>
          {title ? <MessageBarTitle>{title}</MessageBarTitle> : null}
          {messages.join(' ')}
        </MessageBarBody>
      </MessageBar>
    </div>
  );
}
