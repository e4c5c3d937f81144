import { Button } from '@fluentui/react-components';
import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { EmptyState } from './empty-state';
import { ErrorState } from './error-state';
import { LoadingState } from './loading-state';

export interface PagedListStatesProps<Page extends { items: readonly unknown[]; total: number }> {
  /** The page's query. */
  result: UseQueryResult<Page>;
  /** The page asked for (1-based), for "Nothing on page N". */
  page: number;
  /** e.g. "Loading parcels…". */
  loadingLabel: string;
  /** e.g. "Parcels could not be loaded". */
  errorTitle: string;
  /** Back to page 1 with the same filters. */
  onFirstPage: () => void;
  /** Set when filters narrow the list: what to say when nothing matches, and how to clear them. */
  noMatch: { title: string; clearLabel?: string; onClear: () => void; text: ReactNode } | null;
  /** The list has nothing at all yet: its own empty state. */
  empty: ReactNode;
  /** The page, once it has rows. */
  children: (page: Page) => ReactNode;
}

/**
 * What a paginated list shows besides its rows, the same everywhere: loading, an error with a
 * retry, a page past the end, no match for the filters, nothing yet; else the rows, marked busy
 * while the next page loads.
 */
export function PagedListStates<Page extends { items: readonly unknown[]; total: number }>({
  result,
  page,
  loadingLabel,
  errorTitle,
  onFirstPage,
  noMatch,
  empty,
  children,
}: PagedListStatesProps<Page>) {
  if (result.isPending) return <LoadingState label={loadingLabel} />;
  if (result.isError) {
    return (
      <ErrorState
        title={errorTitle}
        error={result.error}
        onRetry={() => void result.refetch()}
        retrying={result.isFetching}
        headingLevel={3}
      />
    );
  }
  if (result.data.items.length > 0) {
    return <div aria-busy={result.isPlaceholderData}>{children(result.data)}</div>;
  }
  if (result.data.total > 0) {
    return (
      <EmptyState
        title={`Nothing on page ${page}`}
        headingLevel={3}
        action={<Button onClick={onFirstPage}>First page</Button>}
      >
        The list is shorter than that now.
      </EmptyState>
    );
  }
  if (noMatch) {
    return (
      <EmptyState
        title={noMatch.title}
        headingLevel={3}
        action={<Button onClick={noMatch.onClear}>{noMatch.clearLabel ?? 'Clear filters'}</Button>}
      >
        {noMatch.text}
      </EmptyState>
    );
  }
  return <>{empty}</>;
}
