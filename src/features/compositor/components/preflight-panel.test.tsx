// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ProductPreflightView } from '@shared/contracts/exports';
import { createMotifPlacement, emptyLayout, mapPlacements } from '@shared/scene';
import { mug11oz } from '@shared/templates';
import { ProductEditor } from '../editor';
import { LIVE_PREFLIGHT_DELAY_MS } from '../preflight/use-live-preflight';
import { PreflightPanel } from './preflight-panel';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const serverAnswer: ProductPreflightView = {
  report: { findings: [], summary: { problems: 0, warnings: 0 } },
  motifs: [{ id: 'm-kite', version: 1, name: 'Kite', width: 400, height: 400, rightsStatus: 'own_work', hasTransparency: true }],
  palette: [{ hex: '#1d6f6a', share: 0.6 }, { hex: '#f6f1e8', share: 0.4 }],
  softProof: { shareOverDeltaE5: 0, profileName: 'FOGRA39', deltaE: 5, renderWidth: 1000, renderHeight: 412 },
  paletteLimit: 6,
  productBlanks: [],
};

function setup() {
  vi.stubGlobal('fetch', vi.fn(async () => new Response(JSON.stringify(serverAnswer), { status: 200, headers: { 'Content-Type': 'application/json' } })));
  // 400 px shown at 2.5 times: 120 PPI on the 300 DPI wrap
  const kite = createMotifPlacement({ id: 'kite', motifId: 'm-kite', version: 1, naturalWidth: 400, naturalHeight: 400, x: 1275, y: 525, scale: 2.5 });
  const editor = new ProductEditor(mug11oz, { ...emptyLayout, placements: [kite] });
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(<QueryClientProvider client={client}><PreflightPanel editor={editor} productId="p1" savedRevision={1} /></QueryClientProvider>);
  return editor;
}

describe('the print check panel', () => {
  it('lists a problem with its fix, and selects the placement it concerns', async () => {
    const editor = setup();
    const row = await screen.findByRole('button', { name: /^Problem: “Kite” prints at 120 PPI/ });
    expect(row.textContent).toContain('What to do: Make it smaller');
    fireEvent.click(row);
    expect(editor.selection).toEqual(['kite']);
    expect(row.getAttribute('aria-pressed')).toBe('true');
    // the server's palette arrives as swatches
    await screen.findByRole('list', { name: 'Colour groups of the design' });
  });

  it('re-runs the rules a moment after the layout changes', async () => {
    const editor = setup();
    await screen.findByRole('button', { name: /^Problem: “Kite”/ });
    act(() => {
      editor.change((l) => mapPlacements(l, ['kite'], (p) => (p.type === 'text' ? p : { ...p, scale: 1 })));
    });
    // still there right after the change: the rules wait for the edits to pause
    expect(screen.queryByRole('button', { name: /^Problem: “Kite”/ })).not.toBeNull();
    await waitFor(() => expect(screen.queryByRole('button', { name: /^Problem: “Kite”/ })).toBeNull(), { timeout: LIVE_PREFLIGHT_DELAY_MS * 8 });
  });
});
