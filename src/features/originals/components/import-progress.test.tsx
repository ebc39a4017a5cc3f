// @vitest-environment happy-dom
import { act, cleanup, screen } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { OriginalSummary } from '@shared/contracts/originals';
import { renderPage } from '../../../testing/render-page';
import { ImportProgress, STALLED_AFTER_MS } from './import-progress';

afterEach(() => {
  cleanup();
  vi.useRealTimers();
});

const importing = (percent: number): OriginalSummary => ({
  id: 'orig-1', name: 'Lantern Walk.psd', fileKind: 'psd', byteSize: 2_400_000, status: 'importing', phase: 'cutting', percent,
  cut: 'groups', width: 1500, height: 2100, layerCount: 12, motifCount: 0, error: null, previousOriginalId: null, uploadedBy: null,
  createdAt: '2026-12-03T09:00:00.000Z', importedAt: null,
});

// The page's poll bringing a new answer, by hand.
let setOriginal: (o: OriginalSummary) => void = () => {};
function Polled({ first }: { first: OriginalSummary }) {
  const [original, set] = useState(first);
  setOriginal = set;
  return <ImportProgress original={original} canImport />;
}

describe('import progress', () => {
  it('says an import that has not moved for a while will start again by itself, and drops it once it moves', () => {
    vi.useFakeTimers();
    renderPage(<Polled first={importing(40)} />);
    expect(screen.getByRole('progressbar').getAttribute('aria-valuenow')).toBe('40');
    act(() => vi.advanceTimersByTime(STALLED_AFTER_MS - 1000));
    expect(screen.queryByText(/has not moved for a while/)).toBeNull();
    act(() => vi.advanceTimersByTime(2000));
    expect(screen.getByText(/has not moved for a while/)).toBeTruthy();
    act(() => setOriginal(importing(55)));
    expect(screen.queryByText(/has not moved for a while/)).toBeNull();
  });
});
