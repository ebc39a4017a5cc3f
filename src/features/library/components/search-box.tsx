import { useEffect, useId, useRef, useState } from 'react';
import { controlClasses } from '../../../components/ui/field-parts';
import { useDebouncedValue } from '../use-debounced-value';

// 250 ms: long enough to skip the in-between words of a typist, short enough to feel live
// (common practice for search-as-you-type; from memory).
const SEARCH_DELAY_MS = 250;

export function SearchBox({ value, onSearch }: { value: string; onSearch: (q: string) => void }) {
  const id = useId();
  const [typed, setTyped] = useState(value);
  const settled = useDebouncedValue(typed, SEARCH_DELAY_MS);
  const lastSent = useRef(value);

  // Back/Forward or a link (a colour swatch, a tag) may change the search from outside.
  useEffect(() => {
    if (value !== lastSent.current) {
      lastSent.current = value;
      setTyped(value);
    }
  }, [value]);

  useEffect(() => {
    if (settled !== lastSent.current) {
      lastSent.current = settled;
      onSearch(settled);
    }
  }, [settled, onSearch]);

  return (
    <div role="search" className="flex flex-col gap-1.5">
      <label htmlFor={id} className="font-semibold text-ink">
        Search motifs
      </label>
      <div className="relative">
        <svg viewBox="0 0 20 20" className="pointer-events-none absolute top-1/2 left-3 size-5 -translate-y-1/2 text-ink-soft" aria-hidden="true" focusable="false">
          <circle cx="8.5" cy="8.5" r="5.5" fill="none" stroke="currentColor" strokeWidth="1.8" />
          <path d="M13 13l4 4" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
        </svg>
        <input
          id={id}
          type="search"
          value={typed}
          maxLength={200}
          placeholder="Names, tags, layer paths, originals, notes"
          onChange={(event) => setTyped(event.target.value)}
          onKeyDown={(event) => {
            if (event.key === 'Enter') {
              lastSent.current = typed;
              onSearch(typed);
            }
          }}
          className={`${controlClasses} border-sand pl-10`}
        />
      </div>
    </div>
  );
}
