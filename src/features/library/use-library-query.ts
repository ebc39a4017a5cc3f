import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { readLibraryQuery, writeLibraryQuery, type LibraryQuery } from '@shared/library/library-address';

// The library's query lives in the address, so a search can be bookmarked, shared and found
// again with Back. Changes replace the entry (typing a word is not a page of history).
export function useLibraryQuery() {
  const [params, setParams] = useSearchParams();
  const key = params.toString();
  // Keyed by the string: the same address gives the same object, so query keys stay stable.
  const query = useMemo(() => readLibraryQuery(new URLSearchParams(key)), [key]);
  const setQuery = useCallback(
    (change: Partial<LibraryQuery>) => {
      setParams((current) => writeLibraryQuery({ ...readLibraryQuery(current), ...change }), {
        replace: true,
        preventScrollReset: true,
      });
    },
    [setParams],
  );
  return { query, setQuery };
}
