import { useEffect, useState } from 'react';

// The server's checks render the design (about a second of its CPU), so a burst of saves asks once.
export const SETTLE_MS = 1_500;

/** The saved revision, once it has stopped changing for a moment; the first one at once. */
export function useSettledRevision(revision: number, settleMs = SETTLE_MS): number {
  const [settled, setSettled] = useState(revision);
  useEffect(() => {
    if (revision === settled) return;
    const timer = setTimeout(() => setSettled(revision), settleMs);
    return () => clearTimeout(timer);
  }, [revision, settled, settleMs]);
  return settled;
}
