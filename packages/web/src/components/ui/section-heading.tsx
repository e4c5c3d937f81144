import { makeStyles, mergeClasses, Text, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';

const useStyles = makeStyles({
  // As tall as a form control, so headings beside a filter and without one line up.
  root: {
    display: 'flex',
    alignItems: 'center',
    minHeight: '32px',
    margin: 0,
    marginBottom: tokens.spacingVerticalS,
  },
});

/** An h2 inside a page; pass `id` to label the section or table below it. */
export function SectionHeading({
  id,
  className,
  children,
}: {
  id?: string;
  className?: string;
  children: ReactNode;
}) {
  const styles = useStyles();
  return (
    <Text
      as="h2"
      id={id}
      size={400}
      weight="semibold"
      className={mergeClasses(styles.root, className)}
    >
      {children}
    </Text>
  );
}
