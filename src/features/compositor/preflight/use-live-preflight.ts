import { useEffect, useState } from 'react';
import type { ProductPreflightView } from '@shared/contracts/exports';
import type { ProductEditor } from '../editor';
import { livePreflight, type LivePreflight } from './live-preflight';

// A pause after the last finished change before the rules run again: quick enough to feel live,
// and a burst of nudges runs them once.
export const LIVE_PREFLIGHT_DELAY_MS = 250;

/** The shared preflight rules on the editor's committed layout, re-run (debounced) as it changes. */
export function useLivePreflight(editor: ProductEditor, server: ProductPreflightView | undefined): LivePreflight {
  const [report, setReport] = useState(() => livePreflight(editor.getState().committedLayout, editor.template, server));
  useEffect(() => {
    let layout = editor.getState().committedLayout;
    setReport(livePreflight(layout, editor.template, server));
    let timer: ReturnType<typeof setTimeout> | null = null;
    const off = editor.subscribe(() => {
      const next = editor.getState().committedLayout;
      if (next === layout) return;
      layout = next;
      if (timer !== null) clearTimeout(timer);
      timer = setTimeout(() => {
        timer = null;
        setReport(livePreflight(layout, editor.template, server));
      }, LIVE_PREFLIGHT_DELAY_MS);
    });
    return () => {
      off();
      if (timer !== null) clearTimeout(timer);
    };
  }, [editor, server]);
  return report;
}
