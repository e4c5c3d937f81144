import { useEffect, useRef, useState } from 'react';
import { useSearchParams } from 'react-router-dom';

/**
 * A list's query (filters, page, order), kept in the URL so a view can be bookmarked or shared.
 * A navigation settles a moment after it is asked for, so the query last asked for is shown
 * until the URL catches up: a second filter changed quickly after the first then builds on it
 * instead of on the URL of a moment ago. A URL change from elsewhere (back button, a link) wins.
 */
export function useQueryInUrl<Q>(
  parse: (params: URLSearchParams) => Q,
  toSearchParams: (query: Q) => URLSearchParams,
): [Q, (next: Q) => void] {
  const [searchParams, setSearchParams] = useSearchParams();
  const search = searchParams.toString();
  const [pending, setPending] = useState<Q | null>(null);
  const asked = useRef<string[]>([]);

  useEffect(() => {
    const index = asked.current.indexOf(search);
    if (index === -1 || index === asked.current.length - 1) {
      asked.current = [];
      setPending(null);
    }
  }, [search]);

  const change = (next: Q) => {
    const nextSearch = toSearchParams(next);
    asked.current.push(nextSearch.toString());
    setPending(next);
    setSearchParams(nextSearch, { replace: true });
  };
  return [pending ?? parse(searchParams), change];
}
