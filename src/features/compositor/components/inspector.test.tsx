// @vitest-environment happy-dom
import { act, cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMotifPlacement, createTextPlacement, emptyLayout } from '@shared/scene';
import { runPreflight } from '@shared/preflight';
import { createScene } from '@shared/scene';
import { mug11oz } from '@shared/templates';
import { Autosaver } from '../autosave';
import { ProductEditor } from '../editor';
import { Inspector } from './inspector';
import { SaveStatusBar } from './save-status';

afterEach(cleanup);

// 369 × 558 px, the demo's red-jumper puffin, placed at twice its size on a 300 DPI wrap: 150 PPI
const puffin = createMotifPlacement({ id: 'puffin', motifId: 'm-puffin', version: 1, naturalWidth: 369, naturalHeight: 558, x: 1200, y: 560, scale: 1.5 });

describe('inspector', () => {
  it('shows the placed size in inches and warns when the motif prints below the template DPI', () => {
    const editor = new ProductEditor(mug11oz, { ...emptyLayout, placements: [puffin] });
    render(<Inspector editor={editor} />);
    expect(screen.getByText(/Pick a placement/)).toBeTruthy();
    act(() => editor.select(['puffin']));
    // 558 × 1.5 = 837 px tall = 2.79 in at 300 DPI
    expect(screen.getByText(/^554 × 837 px · 1\.8\d × 2\.79 in$/)).toBeTruthy();
    const ppi = screen.getByTestId('effective-ppi');
    expect(ppi.textContent).toMatch(/Prints at 200 PPI — below the template’s 300 DPI/);
    expect(ppi.className).toContain('text-ochre');
  });

  it('turns the placement when a new angle is typed, as one undo step', () => {
    const editor = new ProductEditor(mug11oz, { ...emptyLayout, placements: [puffin] });
    editor.select(['puffin']);
    render(<Inspector editor={editor} />);
    const turn = screen.getByLabelText('Turn');
    fireEvent.change(turn, { target: { value: '30' } });
    fireEvent.keyDown(turn, { key: 'Enter' });
    expect(editor.layout.placements[0].rotationDeg).toBe(30);
    act(() => editor.undo());
    expect(editor.layout.placements[0].rotationDeg).toBe(0);
  });
});

describe('text fields', () => {
  it('marks words as a quote and keeps its source, which the quote check then reads', () => {
    const words = createTextPlacement({ id: 'words', content: 'Tide waits for no puffin', fontId: 'source-sans-3', sizePt: 24, boxWidth: 600, boxHeight: 100, x: 1275, y: 525 });
    const editor = new ProductEditor(mug11oz, { ...emptyLayout, placements: [words] });
    editor.select(['words']);
    render(<Inspector editor={editor} />);
    expect(screen.queryByLabelText('Quoted from')).toBeNull();
    fireEvent.click(screen.getByLabelText(/someone else’s words/));
    const quoteCheck = () => runPreflight({ scene: createScene(editor.layout), template: mug11oz, motifs: [] }).findings.filter((f) => f.rule === 'quote-source');
    expect(quoteCheck().map((f) => f.severity)).toEqual(['warning']);
    const source = screen.getByLabelText('Quoted from');
    fireEvent.change(source, { target: { value: 'Harbour almanac, 1931' } });
    fireEvent.blur(source);
    expect(editor.layout.placements[0]).toMatchObject({ isQuote: true, quoteSource: 'Harbour almanac, 1931' });
    expect(quoteCheck().map((f) => f.severity)).toEqual(['ok']);
  });
});

describe('save status', () => {
  it('offers a reload when another tab saved first', async () => {
    const autosaver = new Autosaver(emptyLayout, 7, async () => { throw { code: 'product.stale' }; }, (e) => ({ code: (e as { code: string }).code, message: 'stale' }), 0);
    const onReload = vi.fn();
    render(<SaveStatusBar autosaver={autosaver} onReload={onReload} reloading={false} />);
    expect(screen.getByTestId('save-status').textContent).toBe('Saved · revision 7');
    await act(async () => {
      autosaver.changed({ ...emptyLayout, mirror: true });
      await autosaver.flush();
    });
    const alert = screen.getByRole('alert');
    expect(alert.textContent).toMatch(/another tab/);
    fireEvent.click(within(alert).getByRole('button', { name: 'Reload' }));
    expect(onReload).toHaveBeenCalledTimes(1);
  });
});
