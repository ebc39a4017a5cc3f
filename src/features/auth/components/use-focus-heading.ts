import { useEffect } from 'react';

// When a page swaps its form for a result (sent, saved, joined), focus the new heading so the
// change is announced, the same as after a navigation.
export function useFocusHeadingWhen(trigger: unknown) {
  useEffect(() => {
    if (!trigger) return;
    document.querySelector<HTMLElement>('[data-page-heading]')?.focus();
  }, [trigger]);
}
