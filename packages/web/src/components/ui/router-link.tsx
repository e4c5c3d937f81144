import { Link } from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { useHref, useLinkClickHandler } from 'react-router-dom';

export interface RouterLinkProps {
  to: string;
  children: ReactNode;
  inline?: boolean;
  className?: string;
}

/** A Fluent link that navigates inside the app (and still opens in a new tab on Ctrl/⌘-click). */
export function RouterLink({ to, children, inline, className }: RouterLinkProps) {
  const href = useHref(to);
  const handleClick = useLinkClickHandler<HTMLAnchorElement>(to);
  return (
    <Link as="a" href={href} onClick={handleClick} inline={inline} className={className}>
      {children}
    </Link>
  );
}
