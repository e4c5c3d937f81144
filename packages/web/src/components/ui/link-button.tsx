import { Button, type ButtonProps } from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { useHref, useLinkClickHandler } from 'react-router-dom';

export interface LinkButtonProps {
  to: string;
  children: ReactNode;
  appearance?: ButtonProps['appearance'];
  icon?: ButtonProps['icon'];
  size?: ButtonProps['size'];
  className?: string;
}

/** Looks like a button, behaves like a link: an anchor, so it can be opened in a new tab. */
export function LinkButton({ to, children, appearance, icon, size, className }: LinkButtonProps) {
  const href = useHref(to);
  const handleClick = useLinkClickHandler<HTMLAnchorElement>(to);
  return (
    <Button
      as="a"
      href={href}
      onClick={handleClick}
      appearance={appearance}
      icon={icon}
      size={size}
      className={className}
    >
      {children}
    </Button>
  );
}
